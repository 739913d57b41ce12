import { describe, expect, it } from 'vitest';
import { completeEntry, tramCells } from '../test/field-fixtures';
import { blockingCells, respondentCells, waitingCompletes, withUnsent } from './cell-status';

const young = { 'v-age': 'c-young', 'v-region': 'c-mardon' };
const old = { 'v-age': 'c-old', 'v-region': 'c-quay' };

describe('cell status on the device', () => {
  it('adds this device’s unsent completes to the synced counts', () => {
    const unsent = waitingCompletes([completeEntry(1, 'me', young), completeEntry(2, 'me', old), completeEntry(3, 'me', old)]);
    const cells = withUnsent(tramCells, unsent);
    const byId = Object.fromEntries(cells.map((c) => [c.id, c]));
    expect(byId['cell-young']).toMatchObject({ achieved: 50, remaining: 0, unsent: 1, status: 'full' });
    expect(byId['cell-old']).toMatchObject({ achieved: 12, remaining: 38, unsent: 2, status: 'open' });
    expect(byId['cell-mardon']).toMatchObject({ achieved: 11, unsent: 1 });
    expect(byId['cell-quay']).toMatchObject({ achieved: 12, unsent: 2 });
  });

  it('leaves out refused entries and contacts that are not completes', () => {
    const refused = completeEntry(1, 'me', young, { rejectedReason: 'age_band: unknown category' });
    const refusal = { ...completeEntry(2, 'me', young), payload: { id: 'x', disposition: 'refusal', startedAt: '', endedAt: '' } };
    const cells = withUnsent(tramCells, waitingCompletes([refused, refusal]));
    expect(cells.find((c) => c.id === 'cell-young')).toMatchObject({ achieved: 49, unsent: 0, status: 'nearly_full' });
  });

  it('finds the respondent’s own cells and which of them would put the interview over quota', () => {
    const cells = withUnsent(tramCells, waitingCompletes([completeEntry(1, 'me', young)]));
    const theirs = respondentCells(cells, Object.values(young));
    expect(theirs.map((c) => c.id)).toEqual(['cell-young', 'cell-mardon']);
    expect(blockingCells(theirs).map((c) => c.id)).toEqual(['cell-young']);
    expect(blockingCells(respondentCells(cells, Object.values(old)))).toEqual([]);
  });
});
