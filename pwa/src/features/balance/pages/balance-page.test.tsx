import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = { id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200, status: 'fieldwork' };

const margins = [
  { variable: 'sex', category: 'female', target: 0.51, unweighted: 0.59, weighted: 0.51 },
  { variable: 'sex', category: 'male', target: 0.49, unweighted: 0.41, weighted: 0.49 },
];

const weighted = {
  projectId: 'p1',
  headlineQuestion: 'Do you support extending the tram line to the eastern villages?',
  n: 495,
  excluded: 0,
  notWeighted: 0,
  retired: [],
  converged: true,
  iterations: 5,
  designEffect: 1.205196152351693,
  effectiveSampleSize: 410.72152365746365,
  weightMin: 0.4,
  weightMax: 3.3,
  maxMarginError: 1e-7,
  margins,
  outcome: {
    column: 'headline',
    unweighted: 0.48282828282828283,
    weighted: 0.48029854409059053,
    standardError: 0.0246523809728509,
    interval: [0.4320498, 0.5286012],
    method: 'standard error linearised through the raking; interval Korn and Graubard (1998)',
    marginOfError: 0.04831866670678792,
    impliedBiasFactor: 0.5025331666981944,
    impliedBiasFactorInterval: [0.48253690304233116, 0.5225213303235445],
  },
  weightingProblem: null,
  computedAt: '2026-12-02T10:15:00Z',
};

const noWeights = {
  ...weighted,
  n: 40,
  converged: null,
  iterations: null,
  designEffect: null,
  effectiveSampleSize: null,
  margins: margins.map((m) => ({ ...m, weighted: null })),
  outcome: { column: 'headline', unweighted: 0.45 },
  weightingProblem: 'No completed interviews yet in region: Tarnholm; weights can be computed once every category has at least one.',
};

function figure(group: string, term: string): string | null {
  const list = screen.getByLabelText(group);
  const dt = within(list).getByText(term);
  return dt.nextElementSibling?.textContent ?? null;
}

function expectCautions() {
  const cautions = screen.getByRole('region', { name: 'Read these figures with care' });
  expect(cautions).toHaveTextContent(/model-based figures .* not a sampling guarantee/);
  expect(cautions).toHaveTextContent(/no names, addresses or phone numbers of respondents/);
  expect(cautions).toHaveTextContent(/disclosure codes of the trade and local law/);
}

describe("lead's balance page", () => {
  it('shows the weighting figures, the headline share and the implied bias factor in words', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () => json(weighted));
    await signedInAs('lead');
    renderApp('/lead/balance');

    await screen.findByText('Design effect');
    expect(figure('Weighting figures', 'Design effect')).toBe('1.21');
    expect(figure('Weighting figures', 'Effective sample size')).toBe('411');
    expect(figure('Weighting figures', 'Weighted share, 95% interval')).toBe('43.2% – 52.9%');
    expect(figure('Weighting figures', 'Margin of error (95%)')).toBe('±4.8 pts');
    expect(figure('Headline figures', 'Yes, unweighted')).toBe('48.3%');
    expect(figure('Headline figures', 'Yes, weighted')).toBe('48.0%');
    expect(figure('Headline figures', 'Implied bias factor')).toBe('0.503');
    expect(figure('Headline figures', 'Its 95% interval')).toBe('0.483 – 0.523');
    expect(screen.getByText(/No clear pull either way so far .* the interval includes 0\.5/)).toBeInTheDocument();
    expect(screen.getByText(/0\.5 means the sample’s mix does not pull the headline share/)).toBeInTheDocument();
    // What the bias factor is measured against, and what its interval assumes (docs/methods.md, section 6).
    expect(screen.getByText(/not\s+against the truth, and its interval assumes the interviews are a random draw within their quota cells/)).toBeInTheDocument();

    const sex = screen.getByRole('table', { name: 'sex: shares' });
    const female = within(sex).getByRole('row', { name: /female/ });
    expect(within(female).getAllByRole('cell').map((c) => c.textContent)).toEqual(['51.0%', '59.0%', '+8.0 pts', '51.0%']);
    expectCautions();
  });

  it('shows the interval of a rare share without a ± figure when the interval is lopsided', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () =>
      json({ ...weighted, outcome: { ...weighted.outcome, weighted: 0.04, interval: [0.022, 0.066], marginOfError: 0.0196 } }),
    );
    await signedInAs('lead');
    renderApp('/lead/balance');

    await screen.findByText('Weighted share, 95% interval');
    expect(figure('Weighting figures', 'Weighted share, 95% interval')).toBe('2.2% – 6.6%');
    expect(within(screen.getByLabelText('Weighting figures')).queryByText('Margin of error (95%)')).toBeNull();
    expect(screen.getByRole('region', { name: 'Read these figures with care' })).toHaveTextContent(/shown with a ± only when it is near symmetric/);
  });

  it('says the raw sample overstates the headline share when the whole interval lies above 0.5', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () =>
      json({ ...weighted, outcome: { ...weighted.outcome, unweighted: 0.56, weighted: 0.49, impliedBiasFactor: 0.57, impliedBiasFactorInterval: [0.53, 0.61] } }),
    );
    await signedInAs('lead');
    renderApp('/lead/balance');

    expect(await screen.findByText(/The raw sample overstates the headline share against the weighted figure \(56\.0% before weighting, 49\.0% after\)/)).toBeInTheDocument();
  });

  it('shows why weights are not possible yet, with the sample mix and the cautions', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () => json(noWeights));
    await signedInAs('lead');
    renderApp('/lead/balance');

    const note = await screen.findByRole('note', { name: 'Weights not yet possible' });
    expect(note).toHaveTextContent('No completed interviews yet in region: Tarnholm; weights can be computed once every category has at least one.');
    expect(figure('Weighting figures', 'Design effect')).toBe('—');
    expect(figure('Headline figures', 'Yes, unweighted')).toBe('45.0%');
    expect(figure('Headline figures', 'Yes, weighted')).toBe('—');
    expectCautions();
  });
});

describe("client's progress page", () => {
  it('shows the same figures read-only, with nothing to change or download', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () => json(weighted));
    await signedInAs('client');
    renderApp('/client');

    expect(await screen.findByRole('heading', { level: 1, name: 'Progress' })).toBeInTheDocument();
    await screen.findByText('Design effect');
    expect(screen.getByText((_, el) => el?.tagName === 'P' && el.textContent === '495 of 1,200 completes counted')).toBeInTheDocument();
    expect(figure('Headline figures', 'Implied bias factor')).toBe('0.503');
    expectCautions();
    expect(screen.queryByRole('button', { name: /close|reopen|save|export|download/i })).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /export|download/i })).not.toBeInTheDocument();
    expect(api.calls.map((c) => c.path)).not.toContain('/api/projects/p1/quota-board');
  });

  it('shows a withheld figure as withheld, with the reason in its place', async () => {
    const reason = 'the effective sample size is 22.0, under 30; region: Tarnholm has 3 interviews, fewer than 5';
    const thin = {
      ...weighted,
      n: 26,
      effectiveSampleSize: 22,
      outcome: { ...weighted.outcome, standardError: null, interval: null, marginOfError: null, impliedBiasFactorInterval: null },
      withheld: ['standardError', 'interval', 'marginOfError', 'impliedBiasFactorInterval'].map((figure) => ({ figure, reason })),
    };
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () => json(thin));
    await signedInAs('lead');
    renderApp('/lead/balance');

    await screen.findByText('Design effect');
    expect(figure('Weighting figures', 'Weighted share, 95% interval')).toBe('Withheld');
    expect(screen.queryByText('Margin of error (95%)')).not.toBeInTheDocument();
    expect(figure('Headline figures', 'Its 95% interval')).toBe('Withheld');
    expect(screen.getByRole('note')).toHaveTextContent(`withheld because ${reason}.`);
  });
});
