import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = { id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200, status: 'fieldwork' };

const harbour = {
  id: 'c-harbour', variable: 'District', category: 'Harbour', interviews: 7, mergedInto: null, mergedIntoLabel: null,
  choices: [{ id: 'c-side', label: 'Harbourside' }, { id: 'c-hill', label: 'Hill' }],
};

const balance = {
  projectId: 'p1', headlineQuestion: 'Support?', n: 40, excluded: 0, notWeighted: 7, retired: [harbour],
  converged: null, iterations: null, designEffect: null, effectiveSampleSize: null, weightMin: null, weightMax: null, maxMarginError: null,
  margins: [{ variable: 'District', category: 'Harbourside', target: 0.6, unweighted: 0.5, weighted: null }, { variable: 'District', category: 'Hill', target: 0.4, unweighted: 0.5, weighted: null }],
  outcome: { column: 'headline', unweighted: 0.45 }, weightingProblem: 'Weights need at least two completed interviews.', withheld: [], computedAt: '2026-12-02T10:15:00Z',
};

describe('retired categories on the balance', () => {
  it('says how many interviews are not weighted, and counts them where the lead merges them', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () => json(balance));
    api.on('PUT', '/api/projects/p1/balance/retired/c-harbour', () =>
      json({ ...balance, n: 47, notWeighted: 0, retired: [{ ...harbour, mergedInto: 'c-side', mergedIntoLabel: 'Harbourside' }] }),
    );
    await signedInAs('lead');
    renderApp('/lead/balance');

    const section = await screen.findByRole('region', { name: 'Retired categories' });
    expect(section).toHaveTextContent('7 interviews in retired categories are not weighted: District: Harbour.');
    await userEvent.setup().selectOptions(await screen.findByLabelText('Count District: Harbour as'), 'Harbourside');

    expect(await screen.findByText('Every interview in a retired category is counted as a current category of its variable.')).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'PUT')?.body).toEqual({ mergedInto: 'c-side' });
    expect(screen.getByText((_, el) => el?.tagName === 'P' && el.textContent === '47 of 1,200 completes counted')).toBeInTheDocument();
  });
});
