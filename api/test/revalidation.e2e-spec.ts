// Cheap polling: the lists a device fetches on every sync, the quota board and the balance
// answer an ETag and a 304 when nothing changed, and a new tag as soon as something did.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, TARGETS, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let lead: Awaited<ReturnType<typeof client>>;
let supervisor: Awaited<ReturnType<typeof client>>;
let interviewer: Awaited<ReturnType<typeof client>>;

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Etag');
  lead = await client(h, org, 'lead');
  await lead.patch(`/api/projects/${org.projectId}`, { targetSize: 100, headlineQuestion: 'Support?' });
  targets = (await lead.put(`/api/projects/${org.projectId}/targets`, TARGETS)).body;
  supervisor = await client(h, org, 'supervisor');
  interviewer = await client(h, org, 'interviewer');
  const someone = pick(targets, { age: '35-59', sex: 'male', region: 'South' });
  await interviewer.post(`/api/projects/${org.projectId}/interviews/sync`, { interviews: [complete(someone), complete(someone)] });
});
afterAll(() => h.close());

type Caller = Awaited<ReturnType<typeof client>>;

/** A first fetch, then the same fetch with its tag: the second must be an empty 304. */
async function revalidate(who: Caller, path: string) {
  const first = await who.get(path);
  expect(first.status).toBe(200);
  const tag = first.headers.etag as string;
  expect(tag).toMatch(/^W\/".+"$/);
  // Browsers keep the answer but ask again every time.
  expect(first.headers['cache-control']).toBe('private, no-cache');
  const again = await who.get(path).set('If-None-Match', tag);
  expect(again.status).toBe(304);
  expect(again.text ?? '').toBe('');
  expect(again.headers.etag).toBe(tag);
  return { tag, body: first.body };
}

const syncOne = (labels: Record<string, string>) =>
  interviewer.post(`/api/projects/${org.projectId}/interviews/sync`, { interviews: [complete(pick(targets, labels))] });

describe('ETag and 304 on the polled reads', () => {
  it('answers 304 for an unchanged project list and a new tag after a change', async () => {
    const { tag } = await revalidate(interviewer, '/api/projects');
    await lead.patch(`/api/projects/${org.projectId}`, { name: 'Renamed while a device polls' });
    const after = await interviewer.get('/api/projects').set('If-None-Match', tag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(tag);
    expect(after.body.map((p: { name: string }) => p.name)).toContain('Renamed while a device polls');
  });

  it('keeps the cells tag across calls and changes it when a cell is closed or an interview arrives', async () => {
    const path = `/api/projects/${org.projectId}/cells`;
    const { tag, body } = await revalidate(interviewer, path);
    const cell = body.cells[0] as { id: string };

    await supervisor.post(`/api/projects/${org.projectId}/cells/${cell.id}/close`);
    const afterClose = await interviewer.get(path).set('If-None-Match', tag);
    expect(afterClose.status).toBe(200);
    expect(afterClose.body.cells.find((c: { id: string }) => c.id === cell.id).status).toBe('closed');
    const closedTag = afterClose.headers.etag as string;
    expect(closedTag).not.toBe(tag);

    await syncOne({ age: '60+', sex: 'female', region: 'Coast' });
    const afterInterview = await interviewer.get(path).set('If-None-Match', closedTag);
    expect(afterInterview.status).toBe(200);
    expect(afterInterview.headers.etag).not.toBe(closedTag);
    await supervisor.post(`/api/projects/${org.projectId}/cells/${cell.id}/reopen`);
  });

  it('answers 304 for an unchanged quota board and a new board when an interview arrives', async () => {
    const path = `/api/projects/${org.projectId}/quota-board`;
    const { tag, body } = await revalidate(supervisor, path);
    await syncOne({ age: '18-34', sex: 'female', region: 'North' });
    const after = await supervisor.get(path).set('If-None-Match', tag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(tag);
    const total = (b: { interviewers: { completesTotal: number }[] }) => b.interviewers.reduce((s, i) => s + i.completesTotal, 0);
    expect(total(after.body)).toBe(total(body) + 1);
  });

  it('answers 304 for an unchanged balance and a new balance when an interview arrives', async () => {
    const path = `/api/projects/${org.projectId}/balance`;
    const { tag, body } = await revalidate(lead, path);
    await syncOne({ age: '35-59', sex: 'female', region: 'North' });
    const after = await lead.get(path).set('If-None-Match', tag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(tag);
    expect(after.body.n).toBe(body.n + 1);
  });

  it('answers in full when the device holds another version', async () => {
    const stale = await interviewer.get('/api/projects').set('If-None-Match', 'W/"not-the-current-version"');
    expect(stale.status).toBe(200);
    expect(stale.body.length).toBeGreaterThan(0);
  });
});
