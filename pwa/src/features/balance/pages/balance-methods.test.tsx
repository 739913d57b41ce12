import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = { id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200, status: 'fieldwork' };

const balance = {
  projectId: 'p1',
  headlineQuestion: 'Do you support extending the tram line to the eastern villages?',
  n: 40,
  excluded: 0,
  notWeighted: 0,
  retired: [],
  converged: null,
  iterations: null,
  designEffect: null,
  effectiveSampleSize: null,
  weightMin: null,
  weightMax: null,
  maxMarginError: null,
  margins: [{ variable: 'sex', category: 'female', target: 0.51, unweighted: 0.59, weighted: null }],
  outcome: { column: 'headline', unweighted: 0.45 },
  weightingProblem: 'No completed interviews yet in region: Tarnholm; weights can be computed once every category has at least one.',
  computedAt: '2026-12-02T10:15:00Z',
};

describe('balance page: how the figures are worked out', () => {
  it('opens a short summary that names the repository document with the full methods', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () => json(balance));
    await signedInAs('lead');
    renderApp('/lead/balance');

    const summary = await screen.findByText('How these figures are worked out');
    const details = summary.closest('details') as HTMLDetailsElement;
    expect(details.open).toBe(false);
    await userEvent.click(summary);
    expect(details.open).toBe(true);
    expect(within(details).getByText(/Deming and Stephan 1940/)).toBeVisible();
    expect(within(details).getByText('docs/methods.md')).toBeVisible();
  });
});
