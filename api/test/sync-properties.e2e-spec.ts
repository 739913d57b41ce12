// Property: whatever one field of some interviews holds, a sync answers 200 with one result
// per item in the order sent, stores every interview it accepts, and stores every untouched one.
import fc from 'fast-check';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startApp, type Harness, type TestOrg } from './harness.js';
import { client, syncProject, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let interviewer: Awaited<ReturnType<typeof client>>;

beforeAll(async () => {
  h = await startApp();
  ({ org, targets, interviewer } = await syncProject(h, 'Props'));
});
afterAll(() => h.close());

/** Values that have broken date, id or JSON handling somewhere, mixed with arbitrary JSON. */
const awkward = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom(
    '2026-W47-5', '2026-324', '20261120T100000Z', '2026-11-20T10Z', '2026-11-20T10:00:00,5Z', '2026-02-30T10:00:00Z',
    '0000-01-01T00:00:00Z', '9999-12-31T23:59:59Z', '+275760-09-13T00:00:00Z', '00000000-0000-0000-0000-000000000000',
    'FFFFFFFF-FFFF-FFFF-FFFF-FFFFFFFFFFFF', '\u0000', '', 'complete', 'refusal', { toString: 1 }, JSON.parse('{"__proto__": 1}') as object, [], -0, null,
  ) },
  fc.date({ min: new Date(-8.64e15), max: new Date(8.64e15), noInvalidDate: true }).map((d) => d.toISOString()),
  fc.jsonValue(),
  fc.string(),
);
const FIELDS = ['id', 'disposition', 'categories', 'category', 'headlineAnswer', 'startedAt', 'endedAt', 'extra', 'whole', 'idInCapitals'] as const;
const mutation = fc.record({ index: fc.nat(), field: fc.constantFrom(...FIELDS), value: awkward, variable: fc.nat() });
const spec = fc.record({
  size: fc.integer({ min: 1, max: 8 }),
  choices: fc.array(fc.tuple(fc.nat(), fc.nat(), fc.nat(), fc.boolean(), fc.constantFrom('complete', 'partial', 'refusal')), { minLength: 8, maxLength: 8 }),
  mutations: fc.array(mutation, { maxLength: 6 }),
});

function validItem([a, s, r, answer, disposition]: [number, number, number, boolean, string]) {
  const categories: Record<string, string> = {};
  targets.variables.forEach((v, i) => (categories[v.id] = v.categories[[a, s, r][i]! % v.categories.length]!.id));
  return { id: randomUUID(), disposition, categories, headlineAnswer: answer, startedAt: '2026-11-20T10:00:00Z', endedAt: '2026-11-20T10:12:30.5Z' };
}

function mutate(current: unknown, m: { field: (typeof FIELDS)[number]; value: unknown; variable: number }): unknown {
  if (m.field === 'whole') return m.value;
  if (typeof current !== 'object' || current === null || Array.isArray(current)) return current; // no fields left to damage
  const item = current as Record<string, unknown>;
  switch (m.field) {
    case 'extra': return { ...item, note: m.value };
    case 'idInCapitals': return { ...item, id: typeof item.id === 'string' ? item.id.toUpperCase() : item.id };
    case 'category': {
      const variable = targets.variables[m.variable % targets.variables.length]!;
      return { ...item, categories: { ...(item.categories as object), [variable.id]: m.value } };
    }
    default: return { ...item, [m.field]: m.value };
  }
}

describe('sync under arbitrary damage to single fields', () => {
  it('never answers 5xx, answers every item in order, stores what it accepts and every untouched interview', async () => {
    await fc.assert(
      fc.asyncProperty(spec, async ({ size, choices, mutations }) => {
        const items: unknown[] = choices.slice(0, size).map(validItem);
        const touched = new Set<number>();
        for (const m of mutations) {
          const index = m.index % size;
          touched.add(index);
          items[index] = mutate(items[index], m);
        }
        const res = await interviewer.post(`/api/projects/${org.projectId}/interviews/sync`, { interviews: items });
        expect(res.status).toBe(200);
        const results: { id: string | null; status: string; reason?: string }[] = res.body.results;
        expect(results).toHaveLength(size);
        for (const [index, result] of results.entries()) {
          expect(['accepted', 'rejected']).toContain(result.status);
          if (!touched.has(index)) expect(result).toMatchObject({ id: (items[index] as { id: string }).id, status: 'accepted' });
          // A reason is words for the interviewer: never a raw id or a parser's message.
          if (result.status === 'rejected') expect(result.reason).toMatch(/^[\w ,;:'.()-]+$/);
          if (result.status === 'rejected') expect(result.reason).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-/i);
        }
        const accepted = results.filter((r) => r.status === 'accepted').map((r) => r.id as string);
        const stored = await h.db('interviews').whereIn('id', accepted).where({ interviewer_id: org.users.interviewer.id }).count({ n: '*' });
        expect(Number(stored[0]!.n)).toBe(accepted.length);
      }),
      { numRuns: 100 },
    );
  });
});
