import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';
import { onWideScreen } from '../../../test/wide-screen';

const project = {
  id: 'p9', name: 'Kestle Vale bus survey', topic: '', fieldStart: '2027-01-11', fieldEnd: '2027-01-31', targetSize: 400,
  status: 'fieldwork', headlineQuestion: 'Would you use an hourly evening bus?', timeZone: 'UTC', archivedAt: null, mine: null,
};
const mix = (complete: number, refusal: number) => ({ complete, partial: 0, refusal, non_contact: 0, other: 0, not_eligible: 0, quota_full: 1 });
const groups = (I: number, R: number) => ({ I, P: 0, R, NC: 0, O: 0, UH: 0, UO: 0, NE: 1 });
const figures = (complete: number, refusal: number, coop: number) => ({
  contacts: complete + refusal + 1, completes: complete, outcomes: mix(complete, refusal), groups: groups(complete, refusal),
  rates: { COOP1: coop, REF2: 1 - coop, CON2: 1 },
});
const person = (id: string, name: string, complete: number, refusal: number, extra: object = {}) => ({
  interviewerId: id, name, ...figures(complete, refusal, complete / (complete + refusal)), medianDurationSeconds: 900,
  findings: [], test: null, backchecks: { selected: 0, confirmed: 0, notConfirmed: 0, notReached: 0, pending: 0 },
  days: [{ fieldDay: '2027-01-12', ...figures(complete, refusal, complete / (complete + refusal)), medianDurationSeconds: 900 }],
  ...extra,
});
const rates = {
  projectId: 'p9', e: 0.9, rateNames: ['COOP1', 'REF2', 'CON2'], project: figures(30, 20, 0.6),
  interviewers: [
    person('u1', 'Alys Fenwick', 10, 10),
    person('u2', 'Bram Osei', 20, 5, {
      findings: [{ rule: 'too_short', count: 3 }],
      test: { completes: 25, pValue: 0.0004, adjustedPValue: 0.0021, flagged: true, reason: 'Answers lean towards yes' },
      backchecks: { selected: 4, confirmed: 2, notConfirmed: 1, notReached: 0, pending: 1 },
    }),
  ],
};

function serve() {
  const api = installFakeApi();
  api.on('GET', '/api/projects', () => json([project]));
  api.on('GET', '/api/projects/p9/members', () => json([]));
  api.on('GET', '/api/projects/p9/cells', () => json({ variables: [], cells: [], refreshedAt: '2027-01-12T10:00:00Z' }));
  api.on('GET', '/api/projects/p9/assignments', () => json([]));
  api.on('GET', '/api/projects/p9/interviewers/rates', () => json(rates));
}

describe('the interviewers’ rates', () => {
  it('sorts the desktop table by a column and opens an interviewer onto flags, p-values, back-checks and days', async () => {
    onWideScreen();
    serve();
    await signedInAs('supervisor');
    renderApp('/supervisor/interviewers');
    const user = userEvent.setup();
    const table = await screen.findByRole('table', { name: 'Interviewers’ rates' });
    expect(screen.getByText(/rates per contact, not per sampled case: there is no sampled case to count from; no response rate is shown/)).toBeInTheDocument();
    const names = () => within(table).getAllByRole('rowheader').map((cell) => cell.textContent);
    expect(names()).toEqual(['Alys Fenwick', 'Bram Osei']);

    await user.click(within(table).getByRole('button', { name: /Cooperation \(COOP1\)/ }));
    expect(names()).toEqual(['Bram Osei', 'Alys Fenwick']);
    expect(within(table).getByRole('columnheader', { name: /COOP1/ })).toHaveAttribute('aria-sort', 'descending');
    await user.click(within(table).getByRole('button', { name: /Cooperation \(COOP1\)/ }));
    expect(names()).toEqual(['Alys Fenwick', 'Bram Osei']);

    await user.click(within(table).getByRole('button', { name: 'Bram Osei' }));
    expect(screen.getByText('Too short: 3')).toBeInTheDocument();
    expect(screen.getByText(/p < 0.001, adjusted p 0.002, flagged/)).toBeInTheDocument();
    expect(screen.getByText('4 selected: 2 confirmed, 1 not confirmed, 0 could not be reached, 1 to do.')).toBeInTheDocument();
    expect(within(screen.getByRole('table', { name: 'Field days of Bram Osei' })).getAllByRole('row')).toHaveLength(2);
  });

  it('shows a card per interviewer on a phone, ordered by the select', async () => {
    serve();
    await signedInAs('supervisor');
    renderApp('/supervisor/interviewers');
    const user = userEvent.setup();
    const cards = await screen.findByRole('list', { name: 'Interviewers’ rates' });
    const names = () => within(cards).getAllByRole('heading').map((h) => h.textContent);
    expect(names()).toEqual(['Alys Fenwick', 'Bram Osei']);
    expect(within(cards).getAllByRole('listitem')[1]).toHaveTextContent('Turned away: cell full 1');
    await user.selectOptions(screen.getByLabelText('Sort by'), 'Refusal (REF2), highest first');
    expect(names()).toEqual(['Alys Fenwick', 'Bram Osei']);
    await user.selectOptions(screen.getByLabelText('Sort by'), 'Completes, highest first');
    expect(names()).toEqual(['Bram Osei', 'Alys Fenwick']);
    await user.click(within(cards).getByRole('button', { name: /Flags, back-checks and days of Bram Osei/ }));
    expect(screen.getByRole('table', { name: 'Field days of Bram Osei' })).toBeInTheDocument();
  });
});
