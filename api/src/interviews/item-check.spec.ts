import fc from 'fast-check';
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { canonicalUuid, checkCategories, checkItem, parseMoment, type CheckedItem } from './item-check.js';
import type { ActiveTargets } from '../quotas/cell-allocator.js';

const valid = () => ({
  id: randomUUID(),
  disposition: 'complete',
  categories: {},
  headlineAnswer: 'yes',
  startedAt: '2026-11-20T10:00:00Z',
  endedAt: '2026-11-20T10:15:00.250Z',
});
const reasonOf = (raw: unknown) => {
  const result = checkItem(raw);
  return result.ok ? null : result.reason;
};

describe('the headline answer', () => {
  const answerOf = (headlineAnswer: unknown) => {
    const result = checkItem({ ...valid(), headlineAnswer });
    return result.ok ? result.item.headlineAnswer : result.reason;
  };

  it('takes yes, no, don\'t know and no answer, and reads an older device\'s true and false as yes and no', () => {
    for (const answer of ['yes', 'no', 'dont_know', 'no_answer']) expect(answerOf(answer)).toBe(answer);
    expect(answerOf(true)).toBe('yes');
    expect(answerOf(false)).toBe('no');
  });

  it('refuses any other value, naming the four answers', () => {
    for (const bad of ['maybe', 'Yes', 1, ['yes']]) {
      expect(answerOf(bad)).toBe('headlineAnswer must be one of yes, no, dont_know, no_answer');
    }
  });
});

describe('reading a device’s date and time', () => {
  it('reads RFC 3339 date-times with Z or an offset, to the millisecond', () => {
    expect(parseMoment('endedAt', '2026-11-20T10:15:00Z')).toEqual({ ok: true, at: new Date(Date.UTC(2026, 10, 20, 10, 15)) });
    expect(parseMoment('endedAt', '2026-11-20T11:15:00.5+01:00')).toEqual({ ok: true, at: new Date(Date.UTC(2026, 10, 20, 10, 15, 0, 500)) });
    expect(parseMoment('endedAt', '2026-11-20T05:45:00.123456789-04:30')).toEqual({ ok: true, at: new Date(Date.UTC(2026, 10, 20, 10, 15, 0, 123)) });
    expect(parseMoment('endedAt', '2026-02-28t23:59:59z')).toEqual({ ok: true, at: new Date(Date.UTC(2026, 1, 28, 23, 59, 59)) });
  });

  it('reads back every moment a device writes with toISOString, in any offset', () => {
    fc.assert(
      fc.property(fc.date({ min: new Date('2000-01-02T00:00:00Z'), max: new Date('2099-12-30T00:00:00Z'), noInvalidDate: true }), fc.integer({ min: -14 * 60, max: 14 * 60 }), (at, offset) => {
        expect(parseMoment('endedAt', at.toISOString())).toEqual({ ok: true, at });
        const local = new Date(at.getTime() + offset * 60_000).toISOString().slice(0, -1);
        const sign = offset < 0 ? '-' : '+';
        const hhmm = `${String(Math.floor(Math.abs(offset) / 60)).padStart(2, '0')}:${String(Math.abs(offset) % 60).padStart(2, '0')}`;
        expect(parseMoment('endedAt', `${local}${sign}${hhmm}`)).toEqual({ ok: true, at });
      }),
    );
  });

  it.each<[unknown, string]>([
    ['2026-W47-5', 'a week date'],
    ['2026-324', 'an ordinal date'],
    ['20261120T100000Z', 'the basic format'],
    ['2026-11-20T10Z', 'hours alone'],
    ['2026-11-20T10:00Z', 'no seconds'],
    ['2026-11-20T10:00:00,5Z', 'a comma before the fraction'],
    ['2026-11-20T10:00:00', 'no time zone'],
    ['2026-11-20', 'a date alone'],
    [' 2026-11-20T10:00:00Z', 'a leading space'],
    ['+002026-11-20T10:00:00Z', 'an expanded year'],
    [20261120, 'a number'],
  ])('refuses %s (%s), saying what is expected', (value) => {
    expect(parseMoment('startedAt', value)).toEqual({ ok: false, reason: 'startedAt must be a date and time such as 2026-11-20T10:02:00Z' });
  });

  it.each(['2026-02-30T10:00:00Z', '2026-13-01T10:00:00Z', '2026-11-00T10:00:00Z', '2026-11-20T24:00:00Z', '2026-11-20T23:60:00Z', '2026-12-31T23:59:60Z', '2026-11-20T10:00:00+24:00'])(
    'refuses %s: the pattern fits but there is no such moment',
    (value) => {
      expect(parseMoment('endedAt', value)).toEqual({ ok: false, reason: 'endedAt is not a real date and time' });
    },
  );

  it.each([['0000-01-01T00:00:00Z', 0], ['1970-01-01T00:00:00Z', 1970], ['1999-12-31T23:59:59Z', 1999], ['2100-01-01T00:00:00Z', 2100], ['9999-12-31T23:59:59Z', 9999]])(
    'refuses %s: a year no interview can have',
    (value, year) => {
      expect(parseMoment('endedAt', value)).toEqual({ ok: false, reason: `endedAt is in the year ${year}; check the date on the device` });
    },
  );
});

describe('interview ids', () => {
  it('compares UUIDs in lower case and refuses anything else', () => {
    expect(canonicalUuid('6F9619FF-8B86-D011-B42D-00C04FC964FF')).toBe('6f9619ff-8b86-d011-b42d-00c04fc964ff');
    expect(canonicalUuid('{6f9619ff-8b86-d011-b42d-00c04fc964ff}')).toBeNull();
    expect(canonicalUuid('6f9619ff8b86d011b42d00c04fc964ff')).toBeNull();
    expect(canonicalUuid(42)).toBeNull();
  });

  it('answers a valid interview with its id in lower case, and refuses the nil and max UUIDs', () => {
    const item = { ...valid(), id: '6F9619FF-8B86-D011-B42D-00C04FC964FF' };
    const result = checkItem(item);
    expect(result.ok && result.item.id).toBe('6f9619ff-8b86-d011-b42d-00c04fc964ff');
    for (const id of ['00000000-0000-0000-0000-000000000000', 'FFFFFFFF-FFFF-FFFF-FFFF-FFFFFFFFFFFF']) {
      expect(reasonOf({ ...valid(), id })).toBe('id is a placeholder UUID, not one made for this interview');
    }
  });
});

describe('one item on its own', () => {
  it('names each fault in plain words and never throws', () => {
    expect(reasonOf(valid())).toBeNull();
    expect(reasonOf('nonsense')).toBe('not an interview');
    expect(reasonOf(null)).toBe('not an interview');
    expect(reasonOf({ ...valid(), respondentName: 'Jo' })).toBe('respondentName is not part of an interview');
    expect(reasonOf({ ...valid(), endedAt: '2026-11-20T09:00:00Z' })).toBe('endedAt is before startedAt');
    expect(reasonOf({ ...valid(), startedAt: '2026-W47-5' })).toBe('startedAt must be a date and time such as 2026-11-20T10:02:00Z');
    expect(reasonOf({ ...valid(), categories: { A: 'x', a: 'y' } })).toBe('names one quota variable twice');
  });
});

describe('anything at all', () => {
  it('is answered with an interview or a reason in words, never an exception or a raw id', () => {
    const uuid = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/i;
    fc.assert(
      fc.property(fc.oneof(fc.anything(), fc.record({ id: fc.uuid(), disposition: fc.anything(), startedAt: fc.anything(), endedAt: fc.anything(), categories: fc.anything() })), (raw) => {
        const result = checkItem(raw);
        if (!result.ok) {
          expect(result.reason).toMatch(/^[\w ,;:'.()-]+$/);
          expect(result.reason).not.toMatch(uuid);
        }
      }),
      { numRuns: 500 },
    );
  });
});

describe('categories against the project’s targets', () => {
  const category = (id: string, variable: string, label: string, retired = false) =>
    ({ id, variable_id: variable, project_id: 'p', label, position: 0, share: 1, retired, merged_into: null });
  const targets: ActiveTargets = {
    variables: [
      { id: 'v-age', name: 'age', column_name: 'age', project_id: 'p', position: 0, interlocked: false, retired: false, categories: [category('c-young', 'v-age', '18-34'), category('c-old', 'v-age', '65+', true)] },
      { id: 'v-tenure', name: 'tenure', column_name: 'tenure', project_id: 'p', position: 1, interlocked: false, retired: true, categories: [category('c-owner', 'v-tenure', 'owner', true)] },
    ],
  };
  const item = (over: Partial<CheckedItem>): CheckedItem => ({
    id: randomUUID(), disposition: 'complete', categories: { 'v-age': 'c-young' }, headlineAnswer: 'yes', eligibilityKnown: null, startedAt: new Date(), endedAt: new Date(), ...over,
  });

  it('gives the category ids, and plain reasons without raw ids', () => {
    expect(checkCategories(item({}), targets)).toEqual({ ids: ['c-young'], flags: [] });
    expect(checkCategories(item({ categories: { 'v-age': 'C-YOUNG' } }), targets)).toEqual({ ids: ['c-young'], flags: [] });
    expect(checkCategories(item({ categories: { 'v-age': { toString: 1 } } }), targets)).toEqual({ reason: 'age: unknown category' });
    expect(checkCategories(item({ categories: { 'v-region': 'c-north' } }), targets)).toEqual({ reason: 'names a quota variable this project does not have' });
    // A variable the phone did not know yet: kept and flagged, never refused.
    expect(checkCategories(item({ categories: {} }), targets)).toEqual({ ids: [], flags: ['missing_variable'] });
    expect(checkCategories(item({ headlineAnswer: undefined }), targets)).toEqual({ reason: 'headlineAnswer is missing' });
    expect(checkCategories(item({ disposition: 'refusal', categories: {}, headlineAnswer: undefined }), targets)).toEqual({ ids: [], flags: [] });
  });

  it('accepts a category or variable retired while the device was out, flagged, and needs no retired variable', () => {
    expect(checkCategories(item({ categories: { 'v-age': 'c-old' } }), targets)).toEqual({ ids: ['c-old'], flags: ['retired_category'] });
    expect(checkCategories(item({ categories: { 'v-age': 'c-young', 'v-tenure': 'c-owner' } }), targets)).toEqual({ ids: ['c-young', 'c-owner'], flags: ['retired_variable'] });
    expect(checkCategories(item({ categories: { 'v-age': 'c-owner' } }), targets)).toEqual({ reason: 'age: unknown category' });
  });

  it('refuses a complete for a project that has no targets, but keeps a refusal', () => {
    expect(checkCategories(item({ categories: {} }), { variables: [] })).toEqual({ reason: 'the project has no quota targets yet, so a complete cannot be counted' });
    expect(checkCategories(item({ disposition: 'refusal', categories: {} }), { variables: [] })).toEqual({ ids: [], flags: [] });
  });
});
