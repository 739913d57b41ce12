import { describe, expect, it } from 'vitest';
import { DISPOSITIONS } from '../database/tables.js';
import { aaporCounts, aaporGroup } from './aapor-groups.js';

// AAPOR Standard Definitions (9th edition, 2016): the groups of the final dispositions; the
// quota-filled code is a not-eligible case (recalled as 4.80 in the tables, from memory).
describe('AAPOR groups of the contact outcomes', () => {
  it('maps every outcome, eligibility telling NC from UH and O from UO', () => {
    expect(DISPOSITIONS.map((d) => [d, aaporGroup(d, true), aaporGroup(d, null)])).toEqual([
      ['complete', 'I', 'I'],
      ['partial', 'P', 'P'],
      ['refusal', 'R', 'R'],
      ['non_contact', 'NC', 'UH'],
      ['other', 'O', 'UO'],
      ['not_eligible', 'NE', 'NE'],
      ['quota_full', 'NE', 'NE'],
    ]);
    expect(aaporGroup('non_contact', false)).toBe('UH');
  });

  it('adds counts up per group', () => {
    const counts = aaporCounts([
      { disposition: 'quota_full', eligibilityKnown: null, count: 3 },
      { disposition: 'not_eligible', eligibilityKnown: null, count: 2 },
      { disposition: 'non_contact', eligibilityKnown: false, count: 4 },
      { disposition: 'non_contact', eligibilityKnown: true, count: 1 },
    ]);
    expect(counts).toEqual({ I: 0, P: 0, R: 0, NC: 1, O: 0, UH: 4, UO: 0, NE: 5 });
  });
});
