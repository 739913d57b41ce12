import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json, problem } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';
import { onWideScreen } from '../../../test/wide-screen';

const project = { id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200, status: 'closed' };
const board = {
  projectId: 'p1',
  targetSize: 1200,
  cells: [{ id: 'c1', kind: 'margin', label: 'region: Harrowby', categoryIds: [], target: 336, achieved: 176, overQuota: 0, remaining: 160, fillRate: 176 / 336, status: 'open', closedAt: null }],
  interviewers: [],
  refreshedAt: '2026-12-02T10:15:00Z',
};

function serve(flags: () => Response) {
  onWideScreen();
  const api = installFakeApi();
  api.on('GET', '/api/projects', () => json([project]));
  api.on('GET', '/api/projects/p1/quota-board', () => json(board));
  api.on('GET', '/api/projects/p1/interviews/flags', flags);
}

describe('flagged interviews on the quota board', () => {
  it('counts the kept-and-flagged interviews by reason', async () => {
    serve(() =>
      json({
        total: 14,
        byReason: [
          { code: 'project_closed', reason: 'Sent after the project was closed', count: 9 },
          { code: 'outside_field_dates', reason: 'Ended more than a day outside the field dates', count: 6 },
          { code: 'voided', reason: 'Voided after it was sent (no longer counted); the reason is kept with it', count: 1 },
        ],
        voided: [{
          id: 'i1', disposition: 'complete', fieldDay: '2026-11-20', interviewer: 'Ada Quill', voidedBy: 'Ada Quill',
          voidedAt: '2026-11-20T12:00:00Z', reason: 'Logged twice by mistake',
        }],
      }),
    );
    await signedInAs('supervisor');
    renderApp('/supervisor');

    const table = await screen.findByRole('table', { name: 'Flagged interviews' });
    expect(within(table).getByRole('row', { name: /Sent after the project was closed/ })).toHaveTextContent('9');
    expect(within(table).getByRole('row', { name: /outside the field dates/ })).toHaveTextContent('6');
    expect(screen.getByText(/interviews in all/)).toHaveTextContent('14 interviews in all');
    // A voided interview is listed with who logged it and the reason they gave.
    const voided = screen.getByRole('list', { name: 'Voided interviews' });
    expect(within(voided).getByRole('listitem')).toHaveTextContent('Complete by Ada Quill, 2026-11-20');
    expect(within(voided).getByRole('listitem')).toHaveTextContent('Reason: Logged twice by mistake');
    expect(screen.getByRole('table', { name: 'Cells' })).toBeInTheDocument();
  });

  it('says so when nothing is flagged, and keeps the cells when the flags cannot be loaded', async () => {
    serve(() => json({ total: 0, byReason: [], voided: [] }));
    await signedInAs('supervisor');
    const { unmount } = renderApp('/supervisor');
    expect(await screen.findByText('No interviews are flagged.')).toBeInTheDocument();
    unmount();

    serve(() => problem(500, 'Internal Server Error', 'Something went wrong'));
    renderApp('/supervisor');
    expect(await screen.findByText(/flagged interviews could not be loaded/)).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Cells' })).toBeInTheDocument();
  });
});
