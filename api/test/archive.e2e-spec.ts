// Archiving a closed project (issue 10, item 3): out of everyday lists and devices,
// read-only until restored (back to closed); a device's unsent interviews still sync.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, syncProject, TARGETS, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let syncPath: string;
let lead: Awaited<ReturnType<typeof client>>;
let interviewer: Awaited<ReturnType<typeof client>>;
let project: string;

const ids = (body: { id: string }[]) => body.map((p) => p.id);

beforeAll(async () => {
  h = await startApp();
  ({ org, lead, targets, syncPath, interviewer } = await syncProject(h, 'Archive', { fieldStart: '2026-11-16', fieldEnd: '2026-12-06', status: 'fieldwork' }));
  project = `/api/projects/${org.projectId}`;
});
afterAll(() => h.close());

describe('archiving a project', () => {
  it('refuses to archive a project still in the field, and changes nothing', async () => {
    const res = await lead.post(`${project}/archive`);
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/Only a closed project can be archived/);
    expect((await lead.get(project)).body).toMatchObject({ status: 'fieldwork', archivedAt: null });
  });

  it('does not let an interviewer or a supervisor archive', async () => {
    expect((await interviewer.post(`${project}/archive`)).status).toBe(403);
    expect((await (await client(h, org, 'supervisor')).post(`${project}/archive`)).status).toBe(403);
  });

  it('archives a closed project: gone from default lists and devices, listed as archived, kept closed', async () => {
    await lead.patch(project, { status: 'closed' });
    const res = await lead.post(`${project}/archive`);
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('closed');
    expect(Date.parse(res.body.archivedAt)).not.toBeNaN();
    expect(ids((await lead.get('/api/projects')).body)).not.toContain(org.projectId);
    expect(ids((await lead.get('/api/projects?archived=true')).body)).toEqual([org.projectId]);
    expect(ids((await interviewer.get('/api/projects')).body)).not.toContain(org.projectId);
    expect((await lead.get('/api/projects?archived=yes')).status).toBe(400);
    // Still readable by its address.
    expect((await lead.get(project)).status).toBe(200);
    expect((await lead.post(`${project}/archive`)).status).toBe(409);
  });

  it('refuses edits to an archived project with a 409 that says how to get it back', async () => {
    const cellId = (await lead.get(`${project}/cells`)).body.cells[0].id;
    const attempts = [
      await lead.patch(project, { name: 'Renamed' }),
      await lead.patch(project, { status: 'fieldwork' }),
      await lead.put(`${project}/targets`, TARGETS),
      await lead.put(`${project}/members`, { userIds: [] }),
      await lead.put(`${project}/assignments/${org.users.interviewer.id}`, { target: 5 }),
      await (await client(h, org, 'supervisor')).post(`${project}/cells/${cellId}/close`),
    ];
    for (const res of attempts) {
      expect(res.status).toBe(409);
      expect(res.body.message).toMatch(/archived and read-only: restore it/);
    }
    const row = await h.db('projects').where({ id: org.projectId }).first();
    expect(row).toMatchObject({ status: 'closed', name: expect.not.stringMatching('Renamed') });
    expect(await h.db('project_members').where({ project_id: org.projectId })).toHaveLength(2);
  });

  it('accepts what a device still holds for an archived project, flagged as sent after closing', async () => {
    const item = complete(pick(targets, { age: '60+', sex: 'male', region: 'South' }), true, '2026-11-22T09:00:00.000Z');
    const res = await interviewer.post(syncPath, { interviews: [item] });
    expect(res.status).toBe(200);
    expect(res.body.results).toEqual([expect.objectContaining({ id: item.id, status: 'accepted', flags: ['project_closed'] })]);
    expect(await h.db('interviews').where({ id: item.id }).first()).toBeDefined();
  });

  it('restores it to closed and editable, back in the default lists', async () => {
    expect((await interviewer.post(`${project}/restore`)).status).toBe(403);
    const res = await lead.post(`${project}/restore`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'closed', archivedAt: null });
    expect(ids((await lead.get('/api/projects')).body)).toContain(org.projectId);
    expect(ids((await interviewer.get('/api/projects')).body)).toContain(org.projectId);
    expect((await lead.post(`${project}/restore`)).status).toBe(409);
    expect((await lead.patch(project, { name: 'Renamed after restore' })).status).toBe(200);
  });
});
