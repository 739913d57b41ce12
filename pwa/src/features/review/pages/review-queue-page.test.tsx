import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { installFakeApi, json, problem } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = {
  id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200,
  status: 'fieldwork', headlineQuestion: 'Support?', timeZone: 'UTC', archivedAt: null, mine: null,
};
const ada = { id: 'u1', name: 'Ada Quill' };
const base = { interviewer: ada, fieldDay: '2026-11-20', disposition: 'complete', categories: [{ variable: 'Region', label: 'Harrowby' }], headlineAnswer: 'yes', reviewStatus: 'pending' };
const short = {
  ...base, id: 'i1', startedAt: '2026-11-20T10:00:00Z', endedAt: '2026-11-20T10:04:00Z', durationSeconds: 240,
  flags: [{ code: 'too_short', label: 'Too short', reason: 'Took 4 min; under a third of the median complete (15 min)', figures: [{ name: 'medianMinutes', value: 15 }] }],
};
const over = {
  ...base, id: 'i2', startedAt: '2026-11-20T09:00:00Z', endedAt: '2026-11-20T09:15:00Z', durationSeconds: 900,
  flags: [{ code: 'over_quota', label: 'Over quota', reason: 'Arrived when region: Harrowby was full or closed', figures: [] }],
};
const options = {
  flags: [{ code: 'too_short', label: 'Too short', explanation: '' }, { code: 'over_quota', label: 'Over quota', explanation: '' }],
  interviewers: [ada], fieldDays: ['2026-11-20'], cells: [{ id: 'c1', label: 'region: Harrowby' }],
};

const requested = () => vi.mocked(fetch).mock.calls.map((c) => new URL(String(c[0]), 'http://localhost')).filter((u) => u.pathname === '/api/projects/p1/review');

describe('the supervisor’s review queue', () => {
  it('lists flagged interviews with reasons, filters by flag and rejects one with a reason', async () => {
    const api = installFakeApi();
    let rejected = false;
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/review/options', () => json(options));
    api.on('GET', '/api/projects/p1/review', () => json({ items: rejected ? [{ ...over, reviewStatus: 'rejected' }] : [short, over], nextCursor: null }));
    api.on('GET', '/api/projects/p1/interviews/i1/decisions', () => json([]));
    api.on('POST', '/api/projects/p1/review/decisions', () => {
      rejected = true;
      return json({ action: 'reject', decided: 1, interviews: [{ id: 'i2', previousStatus: 'pending', newStatus: 'rejected' }] });
    });
    await signedInAs('supervisor');
    renderApp('/supervisor/review');
    const user = userEvent.setup();

    const list = await screen.findByRole('list', { name: 'Interviews to review' });
    const cards = [...list.querySelectorAll<HTMLElement>(':scope > li')];
    expect(cards).toHaveLength(2);
    expect(within(cards[0]!).getByRole('list', { name: 'Flags' })).toHaveTextContent('Too short');
    // Each interview's decisions are fetched when it is opened, not with the list.
    expect(api.calls.filter((c) => c.path.endsWith('/decisions'))).toEqual([]);
    await user.click(within(cards[0]!).getByText('Details, reasons and decisions'));
    expect(cards[0]).toHaveTextContent('Took 4 min; under a third of the median complete (15 min)');
    expect(cards[0]).toHaveTextContent('median minutes15');
    expect(await within(cards[0]!).findByText('No decisions yet.')).toBeInTheDocument();

    await user.selectOptions(screen.getByLabelText('Flag'), 'Over quota');
    await vi.waitFor(() => expect(requested().at(-1)!.searchParams.get('flag')).toBe('over_quota'));

    await user.click(screen.getAllByRole('checkbox')[1]!);
    const actions = screen.getByRole('group', { name: 'Decide on the selected interviews' });
    expect(actions).toHaveTextContent('1 selected');
    await user.click(within(actions).getByRole('button', { name: 'Reject' }));
    const dialog = await screen.findByRole('dialog', { name: 'Reject 1 interview?' });
    await user.click(within(dialog).getByRole('button', { name: 'Reject' }));
    expect(within(dialog).getByRole('alert')).toHaveTextContent('Give a reason');
    expect(api.calls.some((c) => c.method === 'POST')).toBe(false);

    await user.type(within(dialog).getByLabelText('Reason (required)'), '  Cell was full, duplicate respondent  ');
    await user.click(within(dialog).getByRole('button', { name: 'Reject' }));
    await vi.waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(api.calls.find((c) => c.method === 'POST')!.body).toEqual({ action: 'reject', reason: 'Cell was full, duplicate respondent', interviewIds: ['i2'] });
    expect(screen.getByText('Rejected 1 interview.', { selector: '[role="status"]' })).toBeInTheDocument();
    // The queue is fetched again after the decision.
    expect(await screen.findByText('Rejected', { selector: '.pl-review-status' })).toBeInTheDocument();
  });

  it('says why a decision was refused, and exports the decisions as a file', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/review/options', () => json(options));
    api.on('GET', '/api/projects/p1/review', () => json({ items: [short], nextCursor: null }));
    api.on('POST', '/api/projects/p1/review/decisions', () => problem(409, 'Conflict', 'Cannot reinstate this interview: it is pending (reinstate applies to rejected interviews): i1'));
    api.on('GET', '/api/projects/p1/review/decisions.csv', () => new Response('decided_at,interview_id\n', { headers: { 'Content-Type': 'text/csv' } }));
    const saved: Blob[] = [];
    // jsdom has no object URLs: keep what would be saved.
    Object.assign(URL, { createObjectURL: (blob: Blob) => (saved.push(blob), 'blob:decisions'), revokeObjectURL: () => undefined });
    await signedInAs('supervisor');
    renderApp('/supervisor/review');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('checkbox'));
    await user.click(within(screen.getByRole('group', { name: 'Decide on the selected interviews' })).getByRole('button', { name: 'Reinstate' }));
    const dialog = await screen.findByRole('dialog', { name: 'Reinstate 1 interview?' });
    await user.type(within(dialog).getByLabelText('Reason (required)'), 'Checked again');
    await user.click(within(dialog).getByRole('button', { name: 'Reinstate' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent('Cannot reinstate this interview: it is pending');

    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    await user.click(screen.getByRole('button', { name: 'Export decisions (CSV)' }));
    await vi.waitFor(() => expect(saved).toHaveLength(1));
    expect(await saved[0]!.text()).toBe('decided_at,interview_id\n');
  });
});
