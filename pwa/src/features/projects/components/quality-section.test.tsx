import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json, problem } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = { id: 'p9', name: 'Kestle Vale bus survey', topic: '', fieldStart: '2027-01-11', fieldEnd: '2027-01-31', targetSize: 400, status: 'fieldwork', headlineQuestion: 'Evening bus?', timeZone: 'UTC', archivedAt: null };
const defaults = {
  tooShort: { enabled: true, fractionOfMedian: 1 / 3, minimumMinutes: null },
  overlapping: { enabled: true },
  outOfHours: { enabled: true, from: '08:00', to: '21:00' },
  bursts: { enabled: true, perHour: 4 },
  interviewerAnswers: { enabled: true, minimumCompletes: 20, falseDiscoveryRate: 0.1 },
  backChecks: { enabled: true, share: 0.1, raiseAfterNotConfirmed: 0.1, keepReferenceDays: 30 },
};

function api() {
  const fake = installFakeApi();
  let settings: object = defaults;
  fake.on('GET', '/api/projects/p9', () => json(project));
  for (const path of ['targets', 'members', 'assignments']) fake.on('GET', `/api/projects/p9/${path}`, () => json(path === 'targets' ? { variables: [] } : []));
  fake.on('GET', '/api/projects/p9/cells', () => json({ variables: [], cells: [], refreshedAt: '2026-12-02T10:00:00Z' }));
  fake.on('GET', '/api/users', () => json([]));
  fake.on('GET', '/api/projects/p9/quality-settings', () => json({ settings, defaults, checkedAt: '2026-12-02T10:00:00Z' }));
  fake.on('PUT', '/api/projects/p9/quality-settings', ({ body }) => {
    if ((body as typeof defaults).bursts.perHour > 50) return problem(400, 'Bad Request', 'perHour must be at most 50 for this project');
    settings = body as object;
    return json({ settings, defaults, checkedAt: '2026-12-02T10:00:00Z' });
  });
  return fake;
}

describe('the lead’s quality rules', () => {
  it('changes a threshold and switches a rule off, says what is wrong before sending, and shows the server’s reason', async () => {
    const fake = api();
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();
    const form = await screen.findByRole('form', { name: 'Quality rules' });
    expect(within(form).getByText(/^Flags last computed/)).toBeInTheDocument();

    const perHour = within(form).getByLabelText('Completes per hour allowed');
    await user.clear(perHour);
    await user.type(perHour, '2.5');
    await user.click(within(form).getByRole('button', { name: 'Save quality rules' }));
    expect(within(form).getByText('A whole number from 1 to 100')).toBeInTheDocument();
    expect(fake.calls.filter((c) => c.method === 'PUT')).toHaveLength(0);

    await user.clear(perHour);
    await user.type(perHour, '6');
    await user.click(within(form).getByRole('switch', { name: 'Overlapping' }));
    await user.click(within(form).getByRole('button', { name: 'Save quality rules' }));
    expect(await within(form).findByText(/Quality rules saved/)).toBeInTheDocument();
    const sent = fake.calls.filter((c) => c.method === 'PUT').at(-1)!.body as typeof defaults;
    // The untouched third stays a third; only what the lead changed differs.
    expect(sent).toEqual({ ...defaults, bursts: { enabled: true, perHour: 6 }, overlapping: { enabled: false } });

    await user.clear(within(form).getByLabelText('Completes per hour allowed'));
    await user.type(within(form).getByLabelText('Completes per hour allowed'), '60');
    await user.click(within(form).getByRole('button', { name: 'Save quality rules' }));
    expect(await within(form).findByRole('alert')).toHaveTextContent('perHour must be at most 50 for this project');
  });
});
