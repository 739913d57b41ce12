// The quota board's per-interviewer section and cell counts, checked against what the
// test itself sent: after syncs, a rejection on review, a time zone change that re-dates
// field days, and deletes.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../src/auth/password.js';
import { fieldDayIn } from '../src/interviews/sync.service.js';
import { client, complete, pick, TARGETS, type Targets } from './fieldwork-helpers.js';
import { createOrg, PASSWORD, startApp, type Harness, type TestOrg } from './harness.js';

type Api = Awaited<ReturnType<typeof client>>;
interface Sent { id: string; interviewer: string; complete: boolean; endedAt: string; overQuota: boolean; overQuotaCells: string[]; labels: Record<string, string> }
interface Row { id: string; completesToday: number; completesTotal: number; contactsTotal: number; overQuota: number }

let h: Harness;
let org: TestOrg;
let targets: Targets;
let lead: Api;
let supervisor: Api;
const devices: Record<string, Api> = {};
let sent: Sent[] = [];
const rejected = new Set<string>();
let zone = 'Pacific/Kiritimati';
const base = () => `/api/projects/${org.projectId}`;

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Board');
  lead = await client(h, org, 'lead');
  supervisor = await client(h, org, 'supervisor');
  await lead.patch(base(), { targetSize: 10_000, headlineQuestion: 'Support?', timeZone: zone });
  targets = (await lead.put(`${base()}/targets`, TARGETS)).body;
  const [second] = await h.db('users')
    .insert({ organisation_id: org.id, email: `second.${org.id}@board.example`, name: 'second interviewer', role: 'interviewer', password_hash: await hashPassword(PASSWORD) })
    .returning('*');
  await h.db('project_members').insert({ project_id: org.projectId, user_id: second!.id });
  devices[org.users.interviewer.id] = await client(h, org, 'interviewer');
  devices[second!.id] = await client(h, { ...org, users: { ...org.users, interviewer: { id: second!.id, email: second!.email } } }, 'interviewer');
});
afterAll(() => h.close());

async function sync(interviewer: string, items: { labels: Record<string, string>; endedAt: string; complete: boolean }[]) {
  const batch = items.map((x) => {
    const start = new Date(Date.parse(x.endedAt) - 10 * 60_000).toISOString();
    return x.complete
      ? { ...complete(pick(targets, x.labels), true, start), endedAt: x.endedAt }
      : { ...complete({}, true, start), disposition: 'refusal', headlineAnswer: undefined, endedAt: x.endedAt };
  });
  const reply = (await devices[interviewer]!.post(`${base()}/interviews/sync`, { interviews: batch })).body;
  expect(reply.accepted).toBe(batch.length);
  batch.forEach((b, i) => sent.push({ id: b.id, interviewer, complete: items[i]!.complete, endedAt: items[i]!.endedAt, overQuota: reply.results[i].overQuota, overQuotaCells: reply.results[i].overQuotaCells ?? [], labels: items[i]!.labels }));
}

/** What the board should say, worked out from what was sent (JavaScript's own calendar). */
function expected(interviewer: string) {
  const day = fieldDayIn(zone);
  const today = day(new Date().toISOString());
  const mine = sent.filter((s) => s.interviewer === interviewer);
  const counted = mine.filter((s) => s.complete && !rejected.has(s.id));
  return {
    id: interviewer,
    completesToday: counted.filter((s) => day(s.endedAt) === today).length,
    completesTotal: counted.length,
    contactsTotal: mine.length,
    overQuota: counted.filter((s) => s.overQuota).length,
  };
}

async function checkBoard() {
  const board = (await supervisor.get(`${base()}/quota-board`)).body;
  for (const id of Object.keys(devices)) {
    const row = board.interviewers.find((r: Row) => r.id === id);
    expect({ id: row.id, completesToday: row.completesToday, completesTotal: row.completesTotal, contactsTotal: row.contactsTotal, overQuota: row.overQuota }).toEqual(expected(id));
  }
  for (const cell of board.cells as { id: string; label: string; achieved: number; overQuota: number }[]) {
    const inCell = sent.filter((s) => s.complete && !rejected.has(s.id) && cell.label.split(' × ').every((part) => {
      const [variable, category] = part.split(': ');
      return s.labels[variable!] === category;
    }));
    // An over-quota interview counts on the cell that made it so, not on its other cells.
    expect([cell.label, cell.achieved, cell.overQuota]).toEqual([cell.label, inCell.length, inCell.filter((s) => s.overQuotaCells.includes(cell.id)).length]);
  }
  return board;
}

const mix = ['18-34', '35-59', '60+'].flatMap((age) => ['female', 'male'].map((sex) => ({ age, sex, region: age === '60+' ? 'Coast' : 'North' })));

describe('quota board per interviewer', () => {
  it('counts completes today and in total, contacts and over quota after syncs', async () => {
    const now = Date.now();
    // Every 20 minutes over the last two days, so "today" in one zone differs from another's.
    const spread = Array.from({ length: 144 }, (_, i) => ({ labels: mix[i % mix.length]!, endedAt: new Date(now - i * 20 * 60_000).toISOString(), complete: i % 4 !== 3 }));
    const [first, second] = Object.keys(devices) as [string, string];
    await sync(first, spread.slice(0, 100));
    await sync(second, spread.slice(100));
    const cells = (await supervisor.get(`${base()}/cells`)).body.cells;
    const closed = cells.find((c: { label: string }) => c.label === 'region: South');
    await supervisor.post(`${base()}/cells/${closed.id}/close`);
    await sync(second, Array.from({ length: 5 }, () => ({ labels: { age: '35-59', sex: 'male', region: 'South' }, endedAt: new Date(now).toISOString(), complete: true })));
    const board = await checkBoard();
    expect(board.interviewers.find((r: Row) => r.id === second).overQuota).toBe(5);
    // The five went over quota because region: South was closed: they count there, and not on
    // their age × sex cell, which was far from full.
    expect(board.cells.find((c: { label: string }) => c.label === 'region: South').overQuota).toBe(5);
    expect(board.cells.find((c: { label: string }) => c.label === 'age: 35-59 × sex: male').overQuota).toBe(0);
    expect(expected(first).completesToday).toBeGreaterThan(0);
  });

  it('leaves an interview rejected on review out of the counted figures, and counts it again when approved', async () => {
    const victims = sent.filter((s) => s.complete).slice(0, 6).concat(sent.filter((s) => s.overQuota).slice(0, 2));
    await h.db('interviews').whereIn('id', victims.map((v) => v.id)).update({ review_status: 'rejected' });
    for (const v of victims) rejected.add(v.id);
    await checkBoard();
    await h.db('interviews').whereIn('id', victims.slice(0, 3).map((v) => v.id)).update({ review_status: 'approved' });
    for (const v of victims.slice(0, 3)) rejected.delete(v.id);
    await checkBoard();
  });

  it('follows a time zone change that re-dates field days', async () => {
    const days = async () => new Map((await h.db('interviews').where({ project_id: org.projectId }).select('id', 'field_day')).map((r) => [r.id, r.field_day]));
    const before = await days();
    zone = 'Pacific/Pago_Pago';
    expect((await lead.patch(base(), { timeZone: zone })).status).toBe(200);
    // Kiritimati (UTC+14) and Pago Pago (UTC−11) are 25 hours apart, so every interview's field
    // day moves back by one; "today" then counts by Pago Pago's calendar (whether or not its
    // count happens to equal Kiritimati's at this hour, which depends on when the test runs).
    const after = await days();
    const day = fieldDayIn(zone);
    for (const s of sent) expect(after.get(s.id)).toBe(day(s.endedAt));
    expect([...after].every(([id, d]) => d !== before.get(id))).toBe(true);
    await checkBoard();
  });

  it('follows deletes', async () => {
    const gone = sent.filter((_, i) => i % 7 === 0);
    await h.db('interviews').whereIn('id', gone.map((g) => g.id)).delete();
    sent = sent.filter((s) => !gone.includes(s));
    await checkBoard();
  });
});
