// The server's quality flags (issue 11, item 1): interviews that trip each rule are flagged
// with their reasons after a sync, the lead's switches and thresholds change what is flagged,
// bad settings change nothing, and interviewers and clients see none of it.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QualityChecker } from '../src/quality/quality-worker.js';
import { DEFAULT_QUALITY_SETTINGS } from '../src/quality/quality-settings.js';
import { PASSWORD, signIn, startApp, type Harness, type TestOrg } from './harness.js';
import { client, pick, syncProject, type Targets } from './fieldwork-helpers.js';
import { hashPassword } from '../src/auth/password.js';
import { runAsync } from '../src/cli/run.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let lead: Awaited<ReturnType<typeof client>>;
let base: string;
const named: Record<string, string> = {};

const MIN = 60_000;
const at = (day: number, hh: number, mm = 0) => Date.UTC(2026, 10, 16 + day, hh, mm);
function interview(start: number, minutes: number, categories: Record<string, string>, yes: boolean) {
  return { id: randomUUID(), disposition: 'complete', categories, headlineAnswer: yes, startedAt: new Date(start).toISOString(), endedAt: new Date(start + minutes * MIN).toISOString() };
}

/** Another interviewer on the project, signed in; the harness makes one of each role. */
async function interviewer(name: string) {
  const email = `${name.replace(' ', '.').toLowerCase()}.${randomUUID().slice(0, 8)}@quality.example`;
  const [row] = await h.db('users').insert({ organisation_id: org.id, email, name, role: 'interviewer', password_hash: await hashPassword(PASSWORD) }).returning('id');
  await h.db('project_members').insert({ project_id: org.projectId, user_id: row!.id });
  named[name] = row!.id;
  const auth = { Authorization: `Bearer ${(await signIn(h, email)).accessToken}` };
  return (interviews: object[]) => h.http().post(`${base}/interviews/sync`).set(auth).send({ interviews });
}

const recompute = () => h.app.get(QualityChecker).run(org.projectId);
const findings = (rule: string) => h.db('interview_findings').where({ project_id: org.projectId, rule }).select('interview_id', 'reason', 'figures');
const summary = async () => (await lead.get(`${base}/quality/findings-summary`)).body;
const ruleCount = async (code: string) => (await summary()).rules.find((r: { code: string }) => r.code === code).interviews;

const speeder: string[] = [];
let lateStart = '';

beforeAll(async () => {
  h = await startApp();
  ({ org, lead, targets } = await syncProject(h, 'Quality', { timeZone: 'Europe/London', status: 'fieldwork' }));
  base = `/api/projects/${org.projectId}`;
  const cells = [pick(targets, { age: '18-34', sex: 'female', region: 'North' }), pick(targets, { age: '60+', sex: 'male', region: 'South' })];
  // Four steady interviewers: 30 completes each, 20 minutes, two an hour, 40% yes in both cells.
  for (const [k, name] of ['Steady One', 'Steady Two', 'Steady Three', 'Steady Four'].entries()) {
    const send = await interviewer(name);
    const batch = Array.from({ length: 30 }, (_, j) => interview(at(k, 9) + (j % 10) * 30 * MIN + Math.floor(j / 10) * 86_400_000, 20, cells[j % 2]!, j % 5 < 2));
    const reply = await send(batch);
    expect(reply.body.accepted, JSON.stringify(reply.body).slice(0, 300)).toBe(30);
  }
  // One whose answers lean: the same cells, hours and pace, 90% yes.
  const leaner = await interviewer('Leaning Lee');
  expect((await leaner(Array.from({ length: 30 }, (_, j) => interview(at(12, 9) + (j % 10) * 30 * MIN + Math.floor(j / 10) * 86_400_000, 20, cells[j % 2]!, j % 10 < 9)))).body.accepted).toBe(30);
  // One who speeds (six 3-minute completes in half an hour: too short and a burst), overlaps
  // two interviews and starts one at 22:30 London time.
  const fast = await interviewer('Fast Fran');
  const burst = Array.from({ length: 6 }, (_, j) => interview(at(15, 10) + j * 5 * MIN, 3, cells[0]!, false));
  speeder.push(...burst.map((b) => b.id));
  const overlapA = interview(at(16, 10), 20, cells[1]!, true);
  const overlapB = interview(at(16, 10, 10), 20, cells[1]!, false);
  const late = interview(at(16, 22, 30), 20, cells[0]!, true);
  lateStart = late.id;
  expect((await fast([...burst, overlapA, overlapB, late])).body.accepted).toBe(9);
  named.overlapA = overlapA.id;
  named.overlapB = overlapB.id;
});
afterAll(() => h.close());

describe('quality flags computed by the server', () => {
  it('computes the flags by itself after a sync (the queued job)', async () => {
    for (let tries = 0; tries < 300; tries++) {
      const row = await h.db('projects').where({ id: org.projectId }).first('quality_checked_at');
      if (row!.quality_checked_at) break;
      await new Promise((r) => setTimeout(r, 200));
    }
    const jobs = await h.db.raw(`SELECT state, count(*) FROM pgboss.job WHERE name = 'quality-check' GROUP BY state`);
    expect((await summary()).checkedAt, JSON.stringify(jobs.rows)).not.toBeNull();
  }, 70_000);

  it('flags each rule with its reason and the figures behind it', async () => {
    const result = await recompute();
    expect(result.interviews).toBe(4 * 30 + 30 + 9);
    const tooShort = await findings('too_short');
    expect(tooShort.map((f) => f.interview_id).sort()).toEqual([...speeder].sort());
    expect(tooShort[0]!.reason).toBe('Took 3 min; 33.3% of the median complete (20 min) is 6.7 min');
    const burst = await findings('burst');
    expect(burst.map((f) => f.interview_id).sort()).toEqual([...speeder].sort());
    expect(burst[0]!.reason).toBe('One of 6 completes by this interviewer within an hour (more than 4)');
    const overlapping = await findings('overlapping');
    expect(overlapping.map((f) => f.interview_id).sort()).toEqual([named.overlapA, named.overlapB].sort());
    expect(overlapping[0]!.figures).toMatchObject({ overlapMinutes: 10 });
    const outOfHours = await findings('out_of_hours');
    expect(outOfHours.map((f) => f.interview_id)).toEqual([lateStart]);
    expect(outOfHours[0]!.reason).toBe('Started at 22:30, outside the hours 08:00–21:00 (Europe/London)');
  });

  it('flags the interviewer whose headline answers lean, with the p-values, and only them', async () => {
    const body = await summary();
    const byName = new Map(body.interviewers.map((t: { name: string }) => [t.name, t]));
    expect(byName.get('Leaning Lee')).toMatchObject({ completes: 30, flagged: true, reason: expect.stringMatching(/^90% yes where the others' answers in the same cells give /) });
    expect((byName.get('Leaning Lee') as { adjustedPValue: number }).adjustedPValue).toBeLessThan(0.1);
    for (const steady of ['One', 'Two', 'Three', 'Four']) expect(byName.get(`Steady ${steady}`)).toMatchObject({ completes: 30, flagged: false });
    expect(byName.get('Fast Fran')).toMatchObject({ flagged: false, pValue: null, reason: 'Not tested: 9 completes, fewer than 20' });
    expect(body.rules).toEqual([
      { code: 'too_short', label: 'Too short', explanation: expect.any(String), interviews: 6 },
      { code: 'overlapping', label: 'Overlapping', explanation: expect.any(String), interviews: 2 },
      { code: 'out_of_hours', label: 'Out of hours', explanation: expect.any(String), interviews: 1 },
      { code: 'burst', label: 'Burst', explanation: expect.any(String), interviews: 6 },
      { code: 'interviewer_answers', label: 'Interviewer’s answers differ', explanation: expect.any(String), interviews: 30 },
      { code: 'backcheck_not_confirmed', label: 'Back-check not confirmed', explanation: expect.any(String), interviews: 0 },
    ]);
  });

  it('shows the new flags on the quota board with their words; an approved interview stops showing its flags', async () => {
    const board = (await lead.get(`${base}/interviews/flags`)).body;
    expect(board.byReason).toContainEqual({ code: 'too_short', reason: expect.stringMatching(/median complete/), count: 6 });
    expect(board.total).toBe(6 + 2 + 1 + 30);
    await h.db('interviews').where({ id: speeder[0] }).update({ review_status: 'approved' });
    expect(await ruleCount('too_short')).toBe(5);
    expect((await lead.get(`${base}/interviews/flags`)).body.total).toBe(38);
  });
});

describe('the lead\'s quality rules', () => {
  const settingsPath = () => `${base}/quality-settings`;

  it('gives the defaults until the lead changes something', async () => {
    const res = await lead.get(settingsPath());
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ settings: DEFAULT_QUALITY_SETTINGS, defaults: DEFAULT_QUALITY_SETTINGS, checkedAt: expect.any(String) });
  });

  it('switching a rule off removes its flags at the next run; only the change is stored', async () => {
    const settings = { ...DEFAULT_QUALITY_SETTINGS, bursts: { enabled: false, perHour: 4 }, outOfHours: { enabled: true, from: '07:00', to: '23:00' } };
    const res = await lead.put(settingsPath(), settings);
    expect(res.status).toBe(200);
    expect(res.body.settings).toEqual(settings);
    expect((await h.db('projects').where({ id: org.projectId }).first('quality_settings'))!.quality_settings).toEqual({ bursts: { enabled: false }, outOfHours: { from: '07:00', to: '23:00' } });
    await recompute();
    expect(await findings('burst')).toEqual([]);
    expect(await findings('out_of_hours')).toEqual([]);
    expect(await ruleCount('too_short')).toBe(5);
    expect((await lead.get(settingsPath())).body.settings.bursts).toEqual({ enabled: false, perHour: 4 });
  });

  it('computes the flags again by itself when the lead moves the project to another time zone', async () => {
    // 22:30 in London is inside the lead's new hours (07:00–23:00); 23:30 in Berlin is not.
    expect((await lead.patch(base, { timeZone: 'Europe/Berlin' })).status).toBe(200);
    let found: Awaited<ReturnType<typeof findings>> = [];
    for (let tries = 0; tries < 300 && found.length === 0; tries++) {
      found = await findings('out_of_hours');
      if (found.length === 0) await new Promise((r) => setTimeout(r, 200));
    }
    expect(found.map((f) => [f.interview_id, f.reason])).toEqual([[lateStart, 'Started at 23:30, outside the hours 07:00–23:00 (Europe/Berlin)']]);
    expect((await lead.patch(base, { timeZone: 'Europe/London' })).status).toBe(200);
  }, 70_000);

  it('moves the outside-the-field-dates flag with the field dates when they change after interviews arrived', async () => {
    const outside = async () => (await h.db('interviews').where({ project_id: org.projectId }).whereRaw("'outside_field_dates' = ANY (flags)").pluck('field_day')).length;
    const lateDays = await h.db('interviews').where({ project_id: org.projectId }).andWhere('field_day', '>', '2026-11-19').count<{ count: string }[]>('* as count');
    expect(Number(lateDays[0]!.count)).toBeGreaterThan(0);
    // Field dates 16–18 November: anything after the 19th (a day of slack) is outside them.
    expect((await lead.patch(base, { fieldStart: '2026-11-16', fieldEnd: '2026-11-18' })).status).toBe(200);
    await recompute();
    expect(await outside()).toBe(Number(lateDays[0]!.count));
    expect((await lead.patch(base, { fieldEnd: '2026-12-31' })).status).toBe(200);
    await recompute();
    expect(await outside()).toBe(0);
  });

  it.each([
    ['a fraction of 0', { tooShort: { enabled: true, fractionOfMedian: 0, minimumMinutes: null } }, 'fractionOfMedian must be more than 0 and at most 1'],
    ['a time that is not HH:MM', { outOfHours: { enabled: true, from: '8am', to: '21:00' } }, 'from must be a time of day written HH:MM, such as 08:00'],
    ['hours that start and end together', { outOfHours: { enabled: true, from: '09:00', to: '09:00' } }, 'outOfHours.to must differ from outOfHours.from (the working hours would be empty)'],
    ['a burst limit that is not a whole number', { bursts: { enabled: true, perHour: 2.5 } }, 'perHour must be a whole number'],
    ['a false discovery rate of 1', { interviewerAnswers: { enabled: true, minimumCompletes: 20, falseDiscoveryRate: 1 } }, 'falseDiscoveryRate must be more than 0 and less than 1'],
    ['too few completes to test', { interviewerAnswers: { enabled: true, minimumCompletes: 1, falseDiscoveryRate: 0.1 } }, 'minimumCompletes must be at least 2'],
    ['a back-check share over 1', { backChecks: { ...DEFAULT_QUALITY_SETTINGS.backChecks, share: 1.5 } }, 'share must be more than 0 and at most 1'],
    ['references kept a year and more', { backChecks: { ...DEFAULT_QUALITY_SETTINGS.backChecks, keepReferenceDays: 400 } }, 'keepReferenceDays must be at most 365'],
    ['a rule left out', { overlapping: undefined }, "overlapping must be an object with the rule's settings"],
    ['an unknown setting', { bursts: { enabled: true, perHour: 4, perDay: 20 } }, 'property perDay should not exist'],
  ])('refuses %s with a clear message and changes nothing', async (_what, change, message) => {
    const before = await h.db('projects').where({ id: org.projectId }).first('quality_settings');
    const res = await lead.put(settingsPath(), { ...DEFAULT_QUALITY_SETTINGS, ...change });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe(message);
    expect(await h.db('projects').where({ id: org.projectId }).first('quality_settings')).toEqual(before);
  });

  it('refuses changes while the project is archived, as every other edit', async () => {
    await h.db('projects').where({ id: org.projectId }).update({ status: 'closed', archived_at: new Date() });
    try {
      const res = await lead.put(settingsPath(), DEFAULT_QUALITY_SETTINGS);
      expect(res.status).toBe(409);
      expect(res.body.message).toMatch(/archived and read-only/);
    } finally {
      await h.db('projects').where({ id: org.projectId }).update({ status: 'fieldwork', archived_at: null });
    }
  });

  it('lets the supervisor read but not change them; interviewers and clients get neither', async () => {
    const supervisor = await client(h, org, 'supervisor');
    expect((await supervisor.get(settingsPath())).status).toBe(200);
    expect((await supervisor.get(`${base}/quality/findings-summary`)).status).toBe(200);
    expect((await supervisor.put(settingsPath(), DEFAULT_QUALITY_SETTINGS)).status).toBe(403);
    for (const role of ['interviewer', 'client'] as const) {
      const someone = await client(h, org, role);
      expect((await someone.get(settingsPath())).status).toBe(403);
      expect((await someone.put(settingsPath(), DEFAULT_QUALITY_SETTINGS)).status).toBe(403);
      expect((await someone.get(`${base}/quality/findings-summary`)).status).toBe(403);
    }
  });
});

describe('plumbline quality-check', () => {
  it('computes the flags at once and says what it found', async () => {
    let out = '';
    const code = await runAsync(['quality-check', '--project', org.projectId], { out: (t) => (out += t), err: (t) => (out += t) });
    expect(code).toBe(0);
    expect(JSON.parse(out)).toMatchObject({ projectId: org.projectId, interviews: 4 * 30 + 30 + 9, findings: 6 + 2, interviewersFlagged: 1 });
  });

  it('names an unknown project and changes nothing', async () => {
    let err = '';
    const missing = randomUUID();
    expect(await runAsync(['quality-check', '--project', missing], { out: () => undefined, err: (t) => (err += t) })).toBe(2);
    expect(err).toBe(`plumbline quality-check: no project ${missing}; nothing was changed\n`);
  });
});
