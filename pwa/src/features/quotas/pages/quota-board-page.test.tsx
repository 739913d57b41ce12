import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';
import { onWideScreen } from '../../../test/wide-screen';

const project = { id: 'p1', name: 'Vellmoor tram extension', topic: '', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 1200, status: 'fieldwork' };

function cell(id: string, label: string, target: number, achieved: number, status: string) {
  return { id, kind: 'margin', label, categoryIds: [], target, achieved, overQuota: 0, remaining: Math.max(0, target - achieved), fillRate: achieved / target, status, closedAt: null as string | null };
}

const cells = [
  cell('c1', 'region: Harrowby', 336, 176, 'open'),
  cell('c2', 'region: Kestle Vale', 228, 228, 'full'),
  cell('c3', 'region: Mardon', 264, 250, 'nearly_full'),
  cell('c4', 'education: basic', 216, 49, 'open'),
];

function board(list = cells) {
  return {
    projectId: 'p1',
    targetSize: 1200,
    cells: list,
    interviewers: [{ id: 'i1', name: 'Alys Fenwick', completesToday: 7, completesTotal: 64, contactsTotal: 120, overQuota: 0 }],
    refreshedAt: '2026-12-02T10:15:00Z',
  };
}

function rowLabels(): string[] {
  const table = screen.getByRole('table', { name: 'Cells' });
  return within(table).getAllByRole('rowheader').map((header) => header.textContent ?? '');
}

describe("supervisor's quota board on a desktop", () => {
  it('sorts by any column and filters by status and by text', async () => {
    onWideScreen();
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/quota-board', () => json(board()));
    await signedInAs('supervisor');
    renderApp('/supervisor');
    const user = userEvent.setup();

    await screen.findByRole('table', { name: 'Cells' });
    expect(rowLabels()).toEqual(['education: basic', 'region: Harrowby', 'region: Kestle Vale', 'region: Mardon']);

    await user.click(screen.getByRole('button', { name: /Achieved/ }));
    expect(rowLabels()).toEqual(['education: basic', 'region: Harrowby', 'region: Kestle Vale', 'region: Mardon']);
    expect(screen.getByRole('columnheader', { name: /Achieved/ })).toHaveAttribute('aria-sort', 'ascending');
    await user.click(screen.getByRole('button', { name: /Achieved/ }));
    expect(rowLabels()).toEqual(['region: Mardon', 'region: Kestle Vale', 'region: Harrowby', 'education: basic']);

    await user.click(screen.getByRole('button', { name: /Remaining/ }));
    expect(rowLabels()).toEqual(['region: Kestle Vale', 'region: Mardon', 'region: Harrowby', 'education: basic']);

    await user.selectOptions(screen.getByLabelText('Status'), 'Open');
    expect(rowLabels()).toEqual(['region: Harrowby', 'education: basic']);
    expect(screen.getByText('2 of 4 cells')).toBeInTheDocument();

    await user.selectOptions(screen.getByLabelText('Status'), 'All cells');
    // The search's example names a category of this project, not a fixed place.
    expect(screen.getByLabelText('Find a cell').getAttribute('placeholder')).toMatch(/^e\.g\. (basic|Harrowby|Kestle Vale|Mardon)$/);
    await user.type(screen.getByLabelText('Find a cell'), 'kestle');
    expect(rowLabels()).toEqual(['region: Kestle Vale']);

    await user.clear(screen.getByLabelText('Find a cell'));
    await user.type(screen.getByLabelText('Find a cell'), 'nowhere');
    expect(screen.getByRole('heading', { name: 'No cells match' })).toBeInTheDocument();
  });

  it("shows each interviewer's completes today and in total, and when the board was updated", async () => {
    onWideScreen();
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/quota-board', () => json(board()));
    await signedInAs('supervisor');
    renderApp('/supervisor');

    const table = await screen.findByRole('table', { name: 'Interviewers' });
    const row = within(table).getByRole('row', { name: /Alys Fenwick/ });
    expect(within(row).getAllByRole('cell').map((c) => c.textContent)).toEqual(['7', '64', '120', '0']);
    expect(screen.getByText(/^Updated \d\d:\d\d/)).toBeInTheDocument();
  });
});

describe('closing and reopening a cell', () => {
  it('asks for confirmation, calls the server, and shows the closed cell at once', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/quota-board', () => json(board()));
    const closed = { ...cells[0]!, status: 'closed', closedAt: '2026-12-02T10:20:00Z' };
    api.on('POST', '/api/projects/p1/cells/c1/close', () => {
      api.on('GET', '/api/projects/p1/quota-board', () => json(board([closed, ...cells.slice(1)])));
      return json(closed);
    });
    await signedInAs('supervisor');
    renderApp('/supervisor');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Close cell region: Harrowby' }));
    const dialog = screen.getByRole('dialog', { name: 'Close this cell?' });
    expect(dialog).toHaveTextContent('176 of 336 achieved');
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(api.calls.some((c) => c.method === 'POST')).toBe(false);

    await user.click(screen.getByRole('button', { name: 'Close cell region: Harrowby' }));
    await user.click(within(screen.getByRole('dialog')).getByRole('button', { name: 'Close cell' }));

    expect(await screen.findByRole('button', { name: 'Reopen cell region: Harrowby' })).toBeInTheDocument();
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(api.calls.filter((c) => c.method === 'POST').map((c) => c.path)).toEqual(['/api/projects/p1/cells/c1/close']);
    const item = within(screen.getByRole('list', { name: 'Cells' })).getByText('region: Harrowby').closest('li')!;
    expect(within(item).getByText('Closed')).toBeInTheDocument();
  });

  it("keeps the dialog open with the server's reason when closing fails", async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p1/quota-board', () => json(board()));
    api.on('POST', '/api/projects/p1/cells/c1/close', () => json({ statusCode: 404, message: 'No such cell' }, 404));
    await signedInAs('supervisor');
    renderApp('/supervisor');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Close cell region: Harrowby' }));
    await user.click(within(screen.getByRole('dialog')).getByRole('button', { name: 'Close cell' }));

    expect(await within(screen.getByRole('dialog')).findByRole('alert')).toHaveTextContent('No such cell');
    const item = within(screen.getByRole('list', { name: 'Cells' })).getByText('region: Harrowby').closest('li')!;
    expect(within(item).getByText('Open')).toBeInTheDocument();
  });
});

describe('several projects', () => {
  it('offers a project picker and remembers the choice', async () => {
    const api = installFakeApi();
    const other = { ...project, id: 'p2', name: 'Harrowby library hours' };
    api.on('GET', '/api/projects', () => json([project, other]));
    api.on('GET', '/api/projects/p1/quota-board', () => json(board()));
    api.on('GET', '/api/projects/p2/quota-board', () => json({ ...board([cell('c9', 'sex: female', 300, 12, 'open')]), projectId: 'p2' }));
    await signedInAs('supervisor');
    const first = renderApp('/supervisor');
    const user = userEvent.setup();

    await screen.findByText('region: Harrowby');
    await user.selectOptions(screen.getByLabelText('Project'), 'Harrowby library hours');
    expect(await screen.findByText('sex: female')).toBeInTheDocument();

    first.unmount();
    renderApp('/supervisor');
    expect(await screen.findByText('sex: female')).toBeInTheDocument();
    expect(screen.getByLabelText('Project')).toHaveValue('p2');
  });

  it('opens on a project in the field rather than a newer one still being set up', async () => {
    const api = installFakeApi();
    const newer = { ...project, id: 'p3', name: 'Old Quay ferry (being set up)', status: 'setup' };
    api.on('GET', '/api/projects', () => json([newer, project]));
    api.on('GET', '/api/projects/p1/quota-board', () => json(board()));
    api.on('GET', '/api/projects/p3/quota-board', () => json({ ...board([]), projectId: 'p3' }));
    await signedInAs('supervisor');
    renderApp('/supervisor');

    expect(await screen.findByText('region: Harrowby')).toBeInTheDocument();
    expect(screen.getByLabelText('Project')).toHaveValue('p1');
  });
});
