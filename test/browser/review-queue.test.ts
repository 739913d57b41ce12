// The supervisor's review queue on a phone (360×640) against the seeded demo: filter the queue
// by a flag, reject one interviewer's day with a reason, and see the quota board's count drop.
// The flag is one the demo's quality rules found (its speeding interviewer's too-short completes);
// at the end the day is reinstated, so the demo is left as found (the trail keeps both
// decisions: it is append-only).
import knex, { type Knex } from 'knex';
import { afterAll, afterEach, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';
import { api, tokenFor, vellmoorId } from './fieldwork-steps.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
let db: Knex;
let day: { interviewerId: string; interviewer: string; fieldDay: string; ids: string[]; categories: string[][]; reasons: string[] };
let projectId: string;
let token: string;

beforeAll(async () => {
  db = knex({ client: 'pg', connection: process.env.DATABASE_URL });
  token = (await tokenFor(baseUrl, 'supervisor@vellmoor.example')).token;
  projectId = await vellmoorId(baseUrl, token);
  // A day of one interviewer with a few counted completes, all awaiting review, some of them too short.
  const { rows } = await db.raw<{ rows: { interviewer_id: string; field_day: string }[] }>(
    `SELECT i.interviewer_id, i.field_day::text FROM interviews i
      WHERE i.project_id = ? GROUP BY 1, 2
      HAVING bool_and(i.review_status = 'pending') AND count(*) FILTER (WHERE i.counted) BETWEEN 2 AND 8
         AND count(*) FILTER (WHERE EXISTS (SELECT 1 FROM interview_findings f WHERE f.interview_id = i.id AND f.rule = 'too_short')) >= 2
      ORDER BY 2 DESC, 1 LIMIT 1`, [projectId]);
  const pick = rows[0]!;
  const interviews = await db('interviews').where({ project_id: projectId, interviewer_id: pick.interviewer_id, field_day: pick.field_day, counted: true }).select('id', 'category_ids');
  const person = await db('users').where({ id: pick.interviewer_id }).first('name');
  const findings = await db('interview_findings').whereIn('interview_id', interviews.map((i) => i.id)).andWhere('rule', 'too_short').select('interview_id', 'reason');
  day = {
    interviewerId: pick.interviewer_id, interviewer: person!.name, fieldDay: pick.field_day,
    ids: interviews.map((i) => i.id), categories: interviews.map((i) => i.category_ids), reasons: findings.map((f) => f.reason),
  };
});

afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

afterAll(async () => {
  const statuses = await db('interviews').whereIn('id', day.ids).pluck('review_status');
  if (statuses.includes('rejected')) {
    await api(baseUrl, token, `/projects/${projectId}/review/decisions`, 'POST', { action: 'reinstate', reason: 'Browser test: put back as found', selection: { interviewerId: day.interviewerId, fieldDay: day.fieldDay } });
  }
  await db.destroy();
});

describe('the review queue on a phone', () => {
  it('filters by a flag, rejects one interviewer’s day with a reason, and the board’s count drops', async () => {
    const board = await api<{ cells: { label: string; kind: string; categoryIds: string[]; achieved: number }[] }>(baseUrl, token, `/projects/${projectId}/quota-board`);
    const cell = board.cells.find((c) => c.kind === 'margin' && day.categories[0]!.includes(c.categoryIds[0]!))!;
    const inCell = day.categories.filter((ids) => cell.categoryIds.every((id) => ids.includes(id))).length;

    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'supervisor@vellmoor.example');
    await page.waitForURL(`${baseUrl}/supervisor`);
    const cellCount = page.getByRole('list', { name: 'Cells' }).getByRole('listitem').filter({ has: page.getByText(cell.label, { exact: true }) }).locator('.pl-cell-count');
    await cellCount.waitFor();
    const shown = async () => Number((await cellCount.textContent())!.split('/')[0]!.replace(/[^\d]/g, ''));
    const before = await shown();

    await page.getByRole('link', { name: 'Review queue' }).first().click();
    await page.getByLabel('Flag', { exact: true }).selectOption({ label: 'Too short' });
    const cards = page.getByRole('list', { name: 'Interviews to review' }).locator(':scope > li');
    const allTooShort = async () => {
      const texts = await cards.allTextContents();
      return texts.length >= day.reasons.length && texts.every((t) => t.includes('Too short'));
    };
    await expect.poll(allTooShort).toBe(true);
    await page.getByLabel('Interviewer', { exact: true }).selectOption({ label: day.interviewer });
    await page.getByLabel('Field day', { exact: true }).selectOption(day.fieldDay);
    await expect.poll(() => cards.count()).toBe(day.reasons.length);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await screenshot(page, 'phone-supervisor-review-queue');

    await cards.first().getByText('Details, reasons and decisions').click();
    // The opened card shows its finding's own reason, with the figures behind it.
    await expect.poll(async () => {
      const opened = (await cards.first().textContent()) ?? '';
      return day.reasons.some((reason) => opened.includes(reason));
    }).toBe(true);
    await cards.first().getByRole('button', { name: 'Reject the day' }).click();
    const dialog = page.getByRole('dialog', { name: /^Reject all of .* interviews on / });
    await dialog.getByLabel('Reason (required)').fill('Whole day too short to be real interviews');
    await screenshot(page, 'phone-supervisor-review-reject-day');
    await dialog.getByRole('button', { name: 'Reject' }).click();
    await page.getByText(/^Rejected \d+ interviews\.$/).first().waitFor();
    expect(await db('interviews').whereIn('id', day.ids).pluck('review_status')).toEqual(day.ids.map(() => 'rejected'));

    await page.getByRole('link', { name: 'Quota board' }).first().click();
    await expect.poll(shown).toBe(before - inCell);
  });
});
