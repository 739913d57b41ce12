import { describe, expect, it } from 'vitest';
import { cellStatus } from '@plumbline/cell-rules';

// Common practice (a field rule of thumb, no published standard): a cell is nearly full when
// at most a tenth of its target remains, and always when only one interview remains.
describe('cellStatus', () => {
  it('turns nearly full exactly when a tenth of the target remains', () => {
    expect(cellStatus(50, 44, false)).toBe('open'); // 6 remain, more than 5
    expect(cellStatus(50, 45, false)).toBe('nearly_full'); // 5 remain = a tenth
    expect(cellStatus(50, 49, false)).toBe('nearly_full');
  });

  it('rounds a tenth of an uneven target up', () => {
    expect(cellStatus(41, 35, false)).toBe('open'); // 6 remain
    expect(cellStatus(41, 36, false)).toBe('nearly_full'); // 5 remain: a tenth of 41 rounded up
  });

  it('counts one remaining interview as nearly full even for small targets', () => {
    expect(cellStatus(3, 1, false)).toBe('open');
    expect(cellStatus(3, 2, false)).toBe('nearly_full');
    expect(cellStatus(1, 0, false)).toBe('nearly_full');
  });

  it('is full when nothing remains, over quota included', () => {
    expect(cellStatus(50, 50, false)).toBe('full');
    expect(cellStatus(50, 53, false)).toBe('full');
    expect(cellStatus(0, 0, false)).toBe('full');
  });

  it('lets a supervisor’s close win over every count', () => {
    expect(cellStatus(50, 0, true)).toBe('closed');
    expect(cellStatus(50, 48, true)).toBe('closed');
    expect(cellStatus(50, 60, true)).toBe('closed');
  });
});
