// Field values that once answered 500 or were stored wrong: each is a 400 (409 for a taken
// e-mail address) naming the field, and the stored project is unchanged.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { client } from './fieldwork-helpers.js';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let org: TestOrg;
let lead: Awaited<ReturnType<typeof client>>;
let projectPath: string;

const PROJECT = { name: 'Harbour survey', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 300, headlineQuestion: 'Support?' };

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Fields');
  lead = await client(h, org, 'lead');
  projectPath = `/api/projects/${org.projectId}`;
  expect((await lead.patch(projectPath, { ...PROJECT, topic: 'Ferries', timeZone: 'Europe/London' })).status).toBe(200);
});
afterAll(() => h.close());

describe('changing a project', () => {
  it.each([
    ['name', 'name must be text'],
    ['topic', 'topic must be text'],
    ['fieldStart', 'fieldStart must be a calendar date written YYYY-MM-DD, such as 2026-11-16'],
    ['fieldEnd', 'fieldEnd must be a calendar date written YYYY-MM-DD, such as 2026-12-06'],
    ['targetSize', 'targetSize must be a whole number'],
    ['headlineQuestion', 'headlineQuestion must be text'],
    ['timeZone', 'timeZone must be a time zone name such as Europe/London'],
    ['status', 'status must be one of setup, fieldwork, closed'],
  ])('refuses null for %s and keeps the project as it was', async (field, message) => {
    const before = (await lead.get(projectPath)).body;
    const res = await lead.patch(projectPath, { [field]: null });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual([{ field, message }]);
    expect((await lead.get(projectPath)).body).toEqual(before);
  });

  it.each(['20261201', '2026-W01', '2026', '2026-324', '2026-02-29', '2026-11-16T00:00:00Z'])(
    'refuses the field date %s as not a calendar date YYYY-MM-DD',
    async (date) => {
      for (const field of ['fieldStart', 'fieldEnd']) {
        const res = await lead.patch(projectPath, { [field]: date });
        expect(res.status).toBe(400);
        expect(res.body.fields).toEqual([{ field, message: expect.stringMatching(new RegExp(`^${field} must be a calendar date written YYYY-MM-DD`)) }]);
      }
      const created = await lead.post('/api/projects', { ...PROJECT, fieldStart: date });
      expect(created.status).toBe(400);
      expect((await lead.get(projectPath)).body.fieldStart).toBe('2026-11-16');
    },
  );

  it('refuses a time zone Node knows but the database does not (US/Pacific-New)', async () => {
    expect(Intl.supportedValuesOf('timeZone').includes('US/Pacific-New') || new Intl.DateTimeFormat('en', { timeZone: 'US/Pacific-New' })).toBeTruthy();
    const res = await lead.patch(projectPath, { timeZone: 'US/Pacific-New' });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual([{ field: 'timeZone', message: 'timeZone US/Pacific-New is not a time zone the database knows; use a name such as Europe/London' }]);
    expect((await lead.get(projectPath)).body.timeZone).toBe('Europe/London');
    expect((await lead.post('/api/projects', { ...PROJECT, timeZone: 'US/Pacific-New' })).status).toBe(400);
    expect((await lead.patch(projectPath, { timeZone: 'America/Los_Angeles' })).body.timeZone).toBe('America/Los_Angeles');
  });

  it('trims names and refuses one that is only spaces', async () => {
    const res = await lead.patch(projectPath, { name: '   \t ' });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual([{ field: 'name', message: 'name must not be empty or only spaces' }]);
    expect((await lead.get(projectPath)).body.name).toBe('Harbour survey');
    const created = await lead.post('/api/projects', { ...PROJECT, name: '  Quay study  ', headlineQuestion: '  ' });
    expect(created.status).toBe(400);
    expect(created.body.fields).toEqual([{ field: 'headlineQuestion', message: 'headlineQuestion must not be empty or only spaces' }]);
    expect((await lead.post('/api/projects', { ...PROJECT, name: '  Quay study  ' })).body.name).toBe('Quay study');
  });
});

describe('targets', () => {
  it('refuses a label of spaces and shares whose sum would overflow, and keeps the saved targets', async () => {
    const before = (await lead.get(`${projectPath}/targets`)).body;
    const blank = await lead.put(`${projectPath}/targets`, { variables: [{ name: 'age', categories: [{ label: '  ', share: 1 }, { label: 'old', share: 1 }] }] });
    expect(blank.status).toBe(400);
    expect(blank.body.fields).toEqual([{ field: 'variables.0.categories.0.label', message: 'label must not be empty or only spaces' }]);
    const huge = await lead.put(`${projectPath}/targets`, { variables: [{ name: 'age', categories: [{ label: 'young', share: 1e308 }, { label: 'old', share: 1e308 }] }] });
    expect(huge.status).toBe(400);
    expect(huge.body.fields.map((f: { field: string }) => f.field)).toEqual(['variables.0.categories.0.share', 'variables.0.categories.1.share']);
    expect(huge.body.message).toMatch(/^share must be at most 1000000000000;/);
    expect((await lead.get(`${projectPath}/targets`)).body).toEqual(before);
  });
});

describe('people', () => {
  it('answers eight simultaneous sign-ups of one address with one 201 and seven 409s', async () => {
    const admin = await client(h, org, 'admin');
    const email = `twin.${org.id.slice(0, 8)}@fields.example`;
    const person = { email, name: 'Twin', role: 'interviewer', password: 'a long enough password' };
    const statuses = (await Promise.all(Array.from({ length: 8 }, () => admin.post('/api/users', person)))).map((r) => r.status);
    expect(statuses.sort()).toEqual([201, 409, 409, 409, 409, 409, 409, 409]);
    expect(await h.db('users').whereRaw('lower(email) = ?', [email]).count<{ count: string }[]>('* as count')).toEqual([{ count: '1' }]);
  });

  it('refuses a name of spaces', async () => {
    const admin = await client(h, org, 'admin');
    const res = await admin.post('/api/users', { email: `blank.${org.id.slice(0, 8)}@fields.example`, name: ' ', role: 'client', password: 'a long enough password' });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual([{ field: 'name', message: 'name must not be empty or only spaces' }]);
  });
});
