import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = { id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200, status: 'fieldwork' };
const board = {
  projectId: 'p1',
  targetSize: 1200,
  cells: [{ id: 'c1', kind: 'margin', label: 'region: Harrowby', categoryIds: [], target: 336, achieved: 176, overQuota: 0, remaining: 160, fillRate: 176 / 336, status: 'open', closedAt: null }],
  interviewers: [],
  refreshedAt: '2026-12-02T10:15:00Z',
};
const gain = (id: string, label: string, target: number, achieved: number) => ({ id, label, target, achieved, remaining: Math.max(0, target - achieved), gain: 0.5, designEffectChange: 0.01 });
const plan = {
  projectId: 'p1', count: 50, n: 640, effectiveSampleSize: 512.4, designEffect: 1.25, planned: 50, effectiveSampleSizeAfter: 561.8, problem: null, computedAt: '2026-12-02T10:15:00Z',
  plan: [
    { id: 'a', label: 'age: 65+ × sex: female', interviews: 18 },
    { id: 'b', label: 'age: 65+ × sex: male', interviews: 12 },
    { id: 'c', label: 'region: Harrowby', interviews: 9 },
    { id: 'd', label: 'education: basic', interviews: 7 },
    { id: 'e', label: 'age: 35-64 × sex: male', interviews: 4 },
  ],
  ranking: [gain('a', 'age: 65+ × sex: female', 90, 40)],
  costly: [gain('x', 'age: 18-34 × sex: female', 80, 95)],
};

async function openBoard(body: object) {
  const api = installFakeApi();
  api.on('GET', '/api/projects', () => json([project]));
  api.on('GET', '/api/projects/p1/quota-board', () => json(board));
  api.on('GET', '/api/projects/p1/next-interviews', () => json(body));
  await signedInAs('supervisor');
  renderApp('/supervisor');
  return screen.findByRole('region', { name: 'Where the next interviews help most' });
}

describe('where the next interviews help most, on the quota board', () => {
  it('says in one sentence where the next 50 interviews go, lists every cell, and names the cells to hold back', async () => {
    const section = await openBoard(plan);
    expect(await within(section).findByText(/^18 in 65\+ · female, 12 in 65\+ · male, 9 in region: Harrowby and 11 in 2 more cells\.$/)).toBeInTheDocument();
    expect(within(section).getByText('Next 50:')).toBeInTheDocument();
    const list = within(section).getByRole('list', { name: 'The next 50 interviews, by cell' });
    expect(within(list).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      '18in 65+ · female', '12in 65+ · male', '9in region: Harrowby', '7in education: basic', '4in 35-64 · male',
    ]);
    expect(section).toHaveTextContent('counts as 562 interviews instead of 512 now');
    const costly = within(section).getByRole('list', { name: 'Hold back: more interviews here cost precision' });
    expect(costly).toHaveTextContent('18-34 · female 95 of 80, 15 over target');
  });

  it('says what to do first when weights cannot be computed yet', async () => {
    const problem = 'No completed interviews yet in age: 65+. Get one in each first: weights, and so this plan, need at least one in every category.';
    const section = await openBoard({ ...plan, plan: [], planned: 0, ranking: [], costly: [], effectiveSampleSize: null, effectiveSampleSizeAfter: null, problem });
    expect(await within(section).findByRole('note')).toHaveTextContent(problem);
    expect(within(section).queryByRole('list')).toBeNull();
  });

  it('says when the open cells have room for fewer interviews than asked', async () => {
    const section = await openBoard({ ...plan, plan: [{ id: 'a', label: 'age: 65+ × sex: female', interviews: 6 }], planned: 6, costly: [] });
    expect(await within(section).findByText(/The open cells have room for only 6 more\./)).toBeInTheDocument();
    expect(within(section).getByText(/^6 in 65\+ · female\.$/)).toBeInTheDocument();
  });
});
