import { describe, expect, it } from 'vitest';
import { flagsOnArrival } from './flags.js';

const field = { status: 'fieldwork' as const, fieldStart: '2026-11-16', fieldEnd: '2026-12-06' };

describe('flags set on arrival', () => {
  it('flags nothing inside the field dates or within a day of either end', () => {
    for (const day of ['2026-11-15', '2026-11-16', '2026-11-30', '2026-12-06', '2026-12-07']) expect(flagsOnArrival(field, day)).toEqual([]);
  });

  it('flags an interview that ended more than a day outside the field dates', () => {
    expect(flagsOnArrival(field, '2026-11-14')).toEqual(['outside_field_dates']);
    expect(flagsOnArrival(field, '2026-12-08')).toEqual(['outside_field_dates']);
    expect(flagsOnArrival({ ...field, fieldStart: '2026-03-01' }, '2026-02-27')).toEqual(['outside_field_dates']);
    expect(flagsOnArrival({ ...field, fieldStart: '2026-03-01' }, '2026-02-28')).toEqual([]);
  });

  it('checks only the field dates that are set', () => {
    expect(flagsOnArrival({ status: 'fieldwork', fieldStart: null, fieldEnd: null }, '2020-01-01')).toEqual([]);
    expect(flagsOnArrival({ status: 'fieldwork', fieldStart: null, fieldEnd: '2026-12-06' }, '2026-12-08')).toEqual(['outside_field_dates']);
  });

  it('flags every interview sent to a closed project, beside any other flag', () => {
    expect(flagsOnArrival({ ...field, status: 'closed' }, '2026-11-20')).toEqual(['project_closed']);
    expect(flagsOnArrival({ ...field, status: 'closed' }, '2026-12-20')).toEqual(['project_closed', 'outside_field_dates']);
  });
});
