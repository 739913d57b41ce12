import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { projectCells, projectTotal } from '../src/estimation/projection.js';
import { buildOpenApiDocument } from '../src/openapi/openapi-document.js';
import { conformanceProblems, responseSchema } from './openapi-conformance.js';
import { createOrg, startApp, type Harness } from './harness.js';
import { client, complete, pick, syncProject } from './fieldwork-helpers.js';

let h: Harness;
let setup: Awaited<ReturnType<typeof syncProject>>;
let path: string;
let asOf: string;

function day(offset: number): string {
  const d = new Date(`${asOf}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + offset);
  return d.toISOString().slice(0, 10);
}

async function log(labels: Record<string, string>, count: number, at: string) {
  const categories = pick(setup.targets, labels);
  const res = await setup.interviewer.post(setup.syncPath, { interviews: Array.from({ length: count }, () => complete(categories, true, at)) });
  expect(res.body.accepted).toBe(count);
}

const YOUNG_WOMEN = { age: '18-34', sex: 'female', region: 'North' };
const MIDDLE_MEN = { age: '35-59', sex: 'male', region: 'South' };
const OLDER_WOMEN = { age: '60+', sex: 'female', region: 'Coast' };

beforeAll(async () => {
  h = await startApp();
  setup = await syncProject(h, 'Projection', { status: 'fieldwork', timeZone: 'UTC' });
  path = `/api/projects/${setup.org.projectId}/projection`;
  asOf = (await setup.lead.get(path)).body.asOf;
  expect((await setup.lead.patch(`/api/projects/${setup.org.projectId}`, { fieldStart: day(-10), fieldEnd: day(9) })).status).toBe(200);
  // Five older women early on; then, over the last 7 full days, 2 young women and 1 middle-aged man a day.
  await log(OLDER_WOMEN, 5, `${day(-9)}T10:00:00.000Z`);
  for (let d = -7; d <= -1; d++) {
    await log(YOUNG_WOMEN, 2, `${day(d)}T10:00:00.000Z`);
    await log(MIDDLE_MEN, 1, `${day(d)}T11:00:00.000Z`);
  }
});
afterAll(() => h.close());

describe('GET /projects/:id/projection', () => {
  it('carries the pace of the last 7 full days to the field end', async () => {
    const res = await setup.lead.get(path);
    expect(res.status).toBe(200);
    const doc = buildOpenApiDocument(h.app);
    expect(conformanceProblems(doc, responseSchema(doc, 'get', '/api/projects/{projectId}/projection', 200), res.body)).toEqual([]);
    const p = res.body;
    expect(p).toMatchObject({ asOf, windowFrom: day(-7), windowTo: day(-1), windowDays: 7, fieldEnd: day(9), daysLeft: 10, completes: 26, completesToday: 0, target: 100, pacePerDay: 3, problem: null });
    // 3 a day over today and 9 more days: 26 + 30.
    expect(p.atEnd.expected).toBeCloseTo(56, 9);
    expect(p.atEnd).toEqual(projectTotal({ completes: 26, windowCompletes: 21, windowDays: 7, remainingDays: 10, target: 100, level: 0.9 }).atEnd);
    // 74 still needed at 3 a day: 25 days.
    expect(p.targetDate.expected).toBe(day(25));
    expect(p.probabilityBelowTarget).toBeGreaterThan(0.99);
  });

  it('finds the cell that cannot fill: no completes over the window', async () => {
    const { cells } = (await setup.lead.get(path)).body as { cells: { label: string; target: number; achieved: number; expected: number; probabilityBelowTarget: number; atRisk: boolean }[] };
    const older = cells.find((c) => c.label.includes('60+') && c.label.toLowerCase().includes('female'))!;
    expect(older).toMatchObject({ achieved: 5, expected: 5, lower: 5, upper: 5, probabilityBelowTarget: 1, atRisk: true });
    const young = cells.find((c) => c.label.includes('18-34') && c.label.toLowerCase().includes('female'))!;
    const [expected] = projectCells([{ id: 'y', target: young.target, achieved: 14, windowCompletes: 14, closed: false }], 7, 10, 0.9);
    expect(young).toMatchObject({ achieved: 14, expected: expected!.expected, probabilityBelowTarget: expected!.probabilityBelowTarget, atRisk: expected!.atRisk });
  });

  it("counts today's completes once: a day's pace logged today leaves the end where it was", async () => {
    await log(YOUNG_WOMEN, 2, new Date(Date.now() - 60_000).toISOString());
    await log(MIDDLE_MEN, 1, new Date(Date.now() - 60_000).toISOString());
    const p = (await setup.lead.get(path)).body;
    expect(p).toMatchObject({ completes: 29, completesToday: 3, pacePerDay: 3 });
    expect(p.atEnd.expected).toBeCloseTo(56, 9);
  });

  it('is read-only for the project\'s client and the supervisor, refused to interviewers, unknown to other organisations', async () => {
    for (const role of ['client', 'supervisor'] as const) expect((await (await client(h, setup.org, role)).get(path)).status).toBe(200);
    expect((await setup.interviewer.get(path)).status).toBe(403);
    const other = await createOrg(h.db, 'Elsewhere');
    expect((await (await client(h, other, 'lead')).get(path)).status).toBe(404);
  });

  it('says why there is no projection before the first full field day', async () => {
    await setup.lead.patch(`/api/projects/${setup.org.projectId}`, { fieldStart: asOf, fieldEnd: day(9) });
    const p = (await setup.lead.get(path)).body;
    expect(p).toMatchObject({ windowDays: 0, pacePerDay: null, atEnd: null, cells: [] });
    expect(p.problem).toMatch(/No full field day yet/);
    const doc = buildOpenApiDocument(h.app);
    expect(conformanceProblems(doc, responseSchema(doc, 'get', '/api/projects/{projectId}/projection', 200), p)).toEqual([]);
  });
});
