import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = { id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200, status: 'fieldwork' };

const cell = (id: string, label: string, over: Record<string, unknown>) => ({
  id, label, target: 60, achieved: 40, closed: false, pacePerDay: 3, expected: 52, lower: 44, upper: 61, probabilityBelowTarget: 0.7, atRisk: true, ...over,
});

const projection = {
  projectId: 'p1',
  level: 0.9,
  asOf: '2026-12-02',
  windowFrom: '2026-11-25',
  windowTo: '2026-12-01',
  windowDays: 7,
  fieldEnd: '2026-12-06',
  daysLeft: 5,
  target: 1200,
  completes: 980,
  completesToday: 0,
  pacePerDay: 40,
  atEnd: { expected: 1180, lower: 1148, upper: 1213 },
  probabilityBelowTarget: 0.81,
  targetReached: false,
  targetDate: { expected: '2026-12-08', earliest: '2026-12-06', latest: '2026-12-10' },
  cells: [
    cell('c1', 'Men 18-34', { achieved: 90, target: 80, expected: 105, lower: 98, upper: 112, probabilityBelowTarget: 0, atRisk: false }),
    cell('c2', 'Women 65+', { achieved: 30, pacePerDay: 0, expected: 30, lower: 30, upper: 30, probabilityBelowTarget: 1 }),
    cell('c3', 'Men 35-64', {}),
  ],
  problem: null,
  computedAt: '2026-12-02T10:15:00Z',
};

function figure(term: string): string | null {
  return within(screen.getByLabelText('Projection figures')).getByText(term).nextElementSibling?.textContent ?? null;
}

describe('projection page', () => {
  it("shows the lead where fieldwork ends, the cells at risk first, and the caution that the pace is assumed to continue", async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects/p1', () => json(project));
    api.on('GET', '/api/projects/p1/projection', () => json(projection));
    await signedInAs('lead');
    renderApp('/lead/projects/p1/projection');

    await screen.findByText('Pace per field day');
    expect(screen.getByText(/Short of the target: 1,180 completes expected by the field end \(6 Dec 2026\), against a target of 1,200\. At this pace it is reached around 8 Dec 2026\./)).toBeInTheDocument();
    expect(figure('At the field end (90% range)')).toBe('1,1801,148 to 1,213');
    expect(figure('Target reached (90% range)')).toBe('8 Dec 20266 Dec 2026 to 10 Dec 2026');
    expect(screen.getByText('Chance of ending below the target: 81%.')).toBeInTheDocument();
    expect(screen.getByText('2 of 3 cells at risk: each ends below its target with a chance over 20%.')).toBeInTheDocument();
    const rows = within(screen.getByRole('table', { name: 'Cells at the field end' })).getAllByRole('row').slice(1);
    expect(rows.map((r) => r.querySelector('th')?.textContent)).toEqual(['Women 65+', 'Men 35-64', 'Men 18-34']);
    expect(within(rows[0]!).getAllByRole('cell').map((c) => c.textContent)).toEqual(['30 / 60', '0.0', '30 (30–30)', '100% · at risk']);
    expect(screen.getByRole('region', { name: 'Read this projection with care' })).toHaveTextContent(/assumes the recent pace continues/);
  });

  it('shows a client the same projection read-only, with why it is missing before the first full day', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/projection', () =>
      json({ ...projection, windowDays: 0, windowFrom: null, windowTo: null, pacePerDay: null, atEnd: null, probabilityBelowTarget: null, targetDate: null, cells: [], problem: 'No full field day yet: the projection starts the day after the first field day.' }),
    );
    await signedInAs('client');
    renderApp('/client/projection');

    expect(await screen.findByText(/No full field day yet/)).toBeInTheDocument();
    expect(screen.queryByLabelText('Projection figures')).toBeNull();
    expect(screen.queryByRole('button', { name: /save|close|change/i })).toBeNull();
    expect(screen.getByRole('region', { name: 'Read this projection with care' })).toBeInTheDocument();
  });
});
