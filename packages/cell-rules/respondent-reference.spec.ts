import { describe, expect, it } from 'vitest';
import { referenceProblem } from '@plumbline/cell-rules/respondent-reference';

describe('respondent reference', () => {
  it('takes short contact-sheet codes', () => {
    for (const code of ['VM-0412', 'A', 'sheet3/17', 'R_22-b', '123456']) expect(referenceProblem(code)).toBeNull();
  });

  it('refuses what looks like an e-mail address or a phone number, saying so', () => {
    expect(referenceProblem('ann@example.org')).toMatch(/e-mail/);
    expect(referenceProblem('07700900123')).toMatch(/phone number/);
    expect(referenceProblem('0770-090-0123')).toMatch(/phone number/);
    expect(referenceProblem('07700 900123')).toMatch(/phone number/);
    expect(referenceProblem('+44 (0)7700 900.123')).toMatch(/phone number/);
    expect(referenceProblem('VM-123456')).toBeNull();
  });

  it('refuses names with spaces, other characters, empty and over-long codes', () => {
    expect(referenceProblem('Ann Smith')).toMatch(/only letters, digits/);
    expect(referenceProblem('')).toMatch(/empty/);
    expect(referenceProblem('A'.repeat(21))).toMatch(/at most 20/);
    expect(referenceProblem(42)).toMatch(/text/);
  });
});
