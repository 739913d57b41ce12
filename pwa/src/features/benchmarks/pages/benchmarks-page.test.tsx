import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = { id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200, status: 'fieldwork' };

const poll = { id: 'a1', source: 'Courier phone poll', fieldStart: '2026-11-18', fieldEnd: '2026-11-21', yes: 412, sampleSize: 1000, share: 0.412, methodGroup: 'Phone', groupBias: 'none', biasFactor: null };

const reconciliation = {
  spread: 0.04,
  defaultSpread: 0.04,
  problem: null,
  truth: { mean: 0.4301, median: 0.4298, lower: 0.4012, upper: 0.4597 },
  groups: [
    { name: 'Phone', bias: { kind: 'none' }, meanFactor: 0.5, lower: 0.5, upper: 0.5, probOverstates: 0, probUnderstates: 0 },
    { name: 'This project (weighted)', bias: { kind: 'unknown', mean: 0.5, spread: 0.04 }, meanFactor: 0.521, lower: 0.47, upper: 0.57, probOverstates: 0.79, probUnderstates: 0.21 },
  ],
  polls: [
    { id: 'a1', source: 'Courier phone poll', methodGroup: 'Phone', successes: 412, trials: 1000, own: false, chanceOutlierProbability: 0.31 },
    { id: 'project', source: 'This project (weighted)', methodGroup: 'This project (weighted)', successes: 152, trials: 330, own: true, chanceOutlierProbability: 0.12 },
  ],
  cautions: ["The reconciliation is only as good as the assumption about each method group's bias: …"],
  computedAt: '2026-12-02T10:15:00Z',
};

describe("lead's benchmarks page", () => {
  it('shows the polls, the reconciled share, the groups and the cautions', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/benchmarks', () => json({ polls: [poll] }));
    api.on('GET', '/api/projects/p1/reconciliation', () => json(reconciliation));
    await signedInAs('lead');
    renderApp('/lead/benchmarks');

    expect(await screen.findByText('43.0%')).toBeInTheDocument();
    expect(screen.getByText(/95% interval 40\.1% to 46\.0%/)).toBeInTheDocument();
    const groups = screen.getByRole('table', { name: 'Bias factor of each method group' });
    const own = within(groups).getByRole('row', { name: /This project/ });
    expect(within(own).getAllByRole('cell').map((c) => c.textContent)).toEqual(['0.521 (0.470–0.570)', '79%', '21%']);
    const polls = screen.getByRole('table', { name: 'Chance-outlier probability of each poll' });
    expect(within(polls).getByRole('row', { name: /This project/ })).toHaveTextContent('46.1% of 330 effective');
    expect(await screen.findByRole('heading', { name: 'Courier phone poll' })).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Read the reconciliation with care' })).toHaveTextContent(/only as good as the assumption/);
  });

  it('records a poll given as a percentage, and shows the server’s word on a bad field', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/benchmarks', () => json({ polls: [] }));
    api.on('GET', '/api/projects/p1/reconciliation', () => json(reconciliation));
    api.on('POST', '/api/projects/p1/benchmarks', () =>
      json({ statusCode: 400, error: 'Bad Request', message: 'fieldEnd must be on or after fieldStart', fields: [{ field: 'fieldEnd', message: 'fieldEnd must be on or after fieldStart' }] }, 400));
    await signedInAs('lead');
    renderApp('/lead/benchmarks');

    fireEvent.click(await screen.findByRole('button', { name: 'Record another poll' }));
    const form = screen.getByRole('form', { name: 'Record another poll' });
    fireEvent.change(within(form).getByLabelText('Source'), { target: { value: 'Panel wave 3' } });
    fireEvent.change(within(form).getByLabelText('Field start'), { target: { value: '2026-11-20' } });
    fireEvent.change(within(form).getByLabelText('Field end'), { target: { value: '2026-11-19' } });
    fireEvent.change(within(form).getByLabelText('Yes (%)'), { target: { value: '47' } });
    fireEvent.change(within(form).getByLabelText('Sample size'), { target: { value: '1500' } });
    fireEvent.change(within(form).getByLabelText('Method group'), { target: { value: 'Online panel' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Record the poll' }));

    expect(await within(form).findByText('fieldEnd must be on or after fieldStart', { selector: '.pl-field-problem' })).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'POST')?.body).toEqual({
      source: 'Panel wave 3', fieldStart: '2026-11-20', fieldEnd: '2026-11-19', share: 0.47, sampleSize: 1500, methodGroup: 'Online panel', groupBias: 'unknown',
    });
  });
});

describe("client's other-polls page", () => {
  it('shows the reconciliation and its cautions read-only, with no spread to change', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/reconciliation', () => json(reconciliation));
    await signedInAs('client');
    renderApp('/client/other-polls');

    expect(await screen.findByText('43.0%')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Read the reconciliation with care' })).toHaveTextContent(/only as good as the assumption/);
    expect(screen.queryByLabelText('Spread prior of an unknown bias')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Record another poll' })).toBeNull();
    expect(api.calls.some((c) => c.path.endsWith('/benchmarks'))).toBe(false);
  });
});
