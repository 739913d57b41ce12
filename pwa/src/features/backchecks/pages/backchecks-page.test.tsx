import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = {
  id: 'p9',
  name: 'Kestle Vale bus survey',
  topic: '',
  fieldStart: '2027-01-11',
  fieldEnd: '2027-01-31',
  targetSize: 400,
  status: 'fieldwork',
  headlineQuestion: 'Would you use an hourly evening bus?',
  timeZone: 'UTC',
  archivedAt: null,
  mine: null,
};

const check = (interviewId: string, over: Record<string, unknown> = {}) => ({
  interviewId,
  interviewerId: 'u1',
  interviewerName: 'Alys Fenwick',
  fieldDay: '2027-01-12',
  categories: [{ variable: 'Age band', category: '35-59' }],
  headlineAnswer: 'yes',
  respondentReference: 'VM-0412',
  referenceDeletedAt: null,
  shareAtSelection: 0.1,
  selectedAt: '2027-01-12T10:00:00Z',
  outcome: null,
  outcomeNote: null,
  recordedByName: null,
  recordedAt: null,
  ...over,
});

describe('the supervisor’s back-checks page', () => {
  it('lists pending back-checks, explains the selection and the privacy rule, and records a not-confirmed outcome with what differed', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    let list = [
      check('i1'),
      check('i2', { interviewerName: 'Bram Osei', respondentReference: null, referenceDeletedAt: '2027-02-20T03:00:00Z', outcome: 'confirmed', recordedByName: 'Sam Supervisor', recordedAt: '2027-01-20T09:00:00Z' }),
    ];
    api.on('GET', '/api/projects/p9/backchecks', () => json({ backchecks: list, share: 0.1, raiseAfterNotConfirmed: 0.1, keepReferenceDays: 30, enabled: true }));
    api.on('POST', '/api/projects/p9/backchecks/i1/outcome', ({ body }) => {
      const b = body as { outcome: string; note?: string };
      list = [check('i1', { outcome: b.outcome, outcomeNote: b.note ?? null, recordedByName: 'Sam Supervisor', recordedAt: '2027-01-21T09:00:00Z' }), list[1]!];
      return json(list[0]);
    });
    await signedInAs('supervisor');
    renderApp('/supervisor/backchecks');
    const user = userEvent.setup();

    const pending = await screen.findByRole('list', { name: 'Pending back-checks' });
    const card = within(pending).getByRole('listitem');
    expect(card).toHaveTextContent('Alys Fenwick');
    expect(card).toHaveTextContent('VM-0412');
    expect(card).toHaveTextContent('Age band: 35-59');
    expect(card).toHaveTextContent('10%');
    expect(screen.getByText(/at least one per interviewer, decided\s+once when each interview arrives/)).toBeInTheDocument();
    expect(screen.getByText(/GDPR Recital 26/)).toHaveTextContent('deletes each reference 30 days after its back-check');
    expect(within(screen.getByRole('list', { name: 'Back-checks done' })).getByRole('listitem')).toHaveTextContent('deleted on 20 Feb 2027');

    await user.click(within(card).getByRole('button', { name: 'Record the outcome' }));
    await user.click(within(card).getByRole('radio', { name: /Not confirmed/ }));
    await user.click(within(card).getByRole('button', { name: 'Save outcome' }));
    expect(within(card).getByRole('alert')).toHaveTextContent('Say what differed from the interview.');
    expect(api.calls.some((c) => c.method === 'POST')).toBe(false);

    await user.type(within(card).getByLabelText('What differed (required)'), 'Respondent says it took five minutes');
    await user.click(within(card).getByRole('button', { name: 'Save outcome' }));
    const done = await screen.findByText(/Not confirmed, recorded by Sam Supervisor/);
    expect(done).toHaveTextContent('Respondent says it took five minutes');
    expect(api.calls.find((c) => c.method === 'POST')?.body).toEqual({ outcome: 'not_confirmed', note: 'Respondent says it took five minutes' });
    expect(screen.getByText('Nothing to call back now.')).toBeInTheDocument();
  });
});
