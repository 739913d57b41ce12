import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = { id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200, status: 'fieldwork' };
const balance = {
  projectId: 'p1', headlineQuestion: 'Support?', n: 495, excluded: 0, notWeighted: 0, retired: [], converged: true, iterations: 5,
  designEffect: 1.2, effectiveSampleSize: 412.5, weightMin: 0.4, weightMax: 3.3, maxMarginError: 1e-7,
  margins: [{ variable: 'sex', category: 'female', target: 0.51, unweighted: 0.59, weighted: 0.51 }],
  outcome: { column: 'headline', unweighted: 0.48 }, weightingProblem: null, withheld: [], computedAt: '2026-12-02T10:15:00Z',
  interviewerEffect: {
    rho: 0.0125, rawRho: 0.0125, m0: 60, mStar: 62, interviewers: 8, interviews: 470,
    designEffect: 1.7625, allSourcesDesignEffect: 2.115, allSourcesEffectiveSampleSize: 234.04,
  },
};

describe('the interviewers’ effect on the balance', () => {
  it('stands beside the weighting’s design effect with the all-sources figures and why the cell mean is taken out', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () => json(balance));
    await signedInAs('lead');
    renderApp('/lead/balance');

    const list = await screen.findByLabelText('Interviewer effect figures');
    const figure = (term: string) => within(list).getByText(term).nextElementSibling?.textContent;
    expect(figure('Intra-interviewer correlation ρ̂')).toBe('0.013');
    expect(figure('Interviewer design effect')).toBe('1.76');
    expect(figure('Design effect, all sources')).toBe('2.12');
    expect(figure('Effective sample size, all sources')).toBe('234');
    expect(screen.getByText(/minus the mean of its weighting cell, because quota interviewers are not assigned at random/)).toBeInTheDocument();
    expect(screen.getByText(/a negative estimate is set to 0/)).toBeInTheDocument();
  });

  it('says when a negative estimate was set to 0', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () => json({ ...balance, interviewerEffect: { ...balance.interviewerEffect, rho: 0, rawRho: -0.0042, designEffect: 1 } }));
    await signedInAs('lead');
    renderApp('/lead/balance');
    const list = await screen.findByLabelText('Interviewer effect figures');
    expect(within(list).getByText('Intra-interviewer correlation ρ̂').parentElement).toHaveTextContent('0.000estimated −0.004, set to 0');
  });

  it('says when there are too few interviewers to tell', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/balance', () => json({ ...balance, interviewerEffect: null }));
    await signedInAs('client');
    renderApp('/client');
    expect(await screen.findByText('Shown once at least two interviewers have completes answering yes or no.')).toBeInTheDocument();
  });
});
