import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json, problem } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = {
  id: 'p9',
  name: 'Kestle Vale bus survey',
  topic: '',
  fieldStart: '2027-01-11',
  fieldEnd: '2027-01-31',
  targetSize: 400,
  status: 'fieldwork',
  headlineQuestion: 'Would you use an hourly evening bus?',
  timeZone: 'UTC',
  archivedAt: null as string | null,
};

const alys = { id: 'u1', name: 'Alys Fenwick', email: 'a@x', role: 'interviewer' };
const cell = (id: string, label: string) => ({ id, kind: 'margin', label, categoryIds: [id], target: 100, achieved: 20, overQuota: 0, remaining: 80, fillRate: 0.2, status: 'open', closedAt: null });

function api(status = 'fieldwork') {
  const fake = installFakeApi();
  let assignments: object[] = [];
  let archivedAt: string | null = null;
  fake.on('GET', '/api/projects/p9', () => json({ ...project, status, archivedAt }));
  fake.on('POST', '/api/projects/p9/archive', () => {
    archivedAt = '2026-12-02T11:00:00Z';
    return json({ ...project, status, archivedAt });
  });
  fake.on('GET', '/api/projects/p9/targets', () => json({ variables: [] }));
  fake.on('GET', '/api/projects/p9/cells', () => json({ variables: [], cells: [cell('c1', 'area: Kestle'), cell('c2', 'area: Vale')], refreshedAt: '2026-12-02T10:00:00Z' }));
  fake.on('GET', '/api/projects/p9/members', () => json([alys]));
  fake.on('GET', '/api/users', () => json([{ ...alys, createdAt: '2026-01-01' }]));
  fake.on('GET', '/api/projects/p9/assignments', () => json(assignments));
  fake.on('PUT', '/api/projects/p9/assignments/u1', ({ body }) => {
    const { target, cellIds } = body as { target: number; cellIds: string[] };
    assignments = [{ userId: 'u1', name: alys.name, target, cellIds, completes: 12, updatedAt: '2026-12-02T10:00:00Z' }];
    return json(assignments[0]);
  });
  fake.on('DELETE', '/api/projects/p9/assignments/u1', () => {
    assignments = [];
    return new Response(null, { status: 204 });
  });
  return fake;
}

describe('assignments in the team section', () => {
  it('sets an interviewer’s completes and cells, shows their progress, and clears it', async () => {
    const fake = api();
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    const list = await screen.findByRole('list', { name: 'Assignments' });
    expect(await within(list).findByText('No assignment: works any cell, no target of their own.')).toBeInTheDocument();
    await user.click(within(list).getByRole('button', { name: 'Set the assignment of Alys Fenwick' }));
    const form = screen.getByRole('form', { name: 'Assignment of Alys Fenwick' });
    // A target that is not a whole number is caught here and nothing is sent.
    await user.type(within(form).getByLabelText('Completes to reach'), '4.5');
    await user.click(within(form).getByRole('button', { name: 'Save assignment' }));
    expect(within(form).getByRole('alert')).toHaveTextContent('whole number from 1 to 1,000,000');
    expect(fake.calls.some((c) => c.method === 'PUT')).toBe(false);

    await user.clear(within(form).getByLabelText('Completes to reach'));
    await user.type(within(form).getByLabelText('Completes to reach'), '40');
    await user.click(within(form).getByLabelText('area: Vale'));
    await user.click(within(form).getByRole('button', { name: 'Save assignment' }));

    await within(list).findByText('40');
    expect(within(list).getByRole('listitem')).toHaveTextContent('12 of 40 completes; cells: area: Vale');
    expect(fake.calls.find((c) => c.method === 'PUT')?.body).toEqual({ target: 40, cellIds: ['c2'] });

    await user.click(within(list).getByRole('button', { name: 'Clear the assignment of Alys Fenwick' }));
    expect(await within(list).findByText('No assignment: works any cell, no target of their own.')).toBeInTheDocument();
    expect(fake.calls.some((c) => c.method === 'DELETE' && c.path === '/api/projects/p9/assignments/u1')).toBe(true);
  });

  it('shows the server’s reason when it refuses an assignment', async () => {
    const fake = api();
    fake.on('PUT', '/api/projects/p9/assignments/u1', () => problem(409, 'Conflict', 'This project is archived and read-only: restore it (it goes back to closed) before changing it.'));
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Set the assignment of Alys Fenwick' }));
    await user.type(screen.getByLabelText('Completes to reach'), '10');
    await user.click(screen.getByRole('button', { name: 'Save assignment' }));
    expect(await screen.findByText(/archived and read-only/)).toBeInTheDocument();
  });
});

describe('archiving a closed project', () => {
  it('asks first, saying what happens, then offers to restore it', async () => {
    const fake = api('closed');
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Archive' }));
    const dialog = screen.getByRole('dialog', { name: 'Archive this project?' });
    expect(dialog).toHaveTextContent('hidden from the project lists');
    expect(dialog).toHaveTextContent('still accepted when it syncs');
    expect(dialog).toHaveTextContent('read-only');
    expect(dialog).toHaveTextContent('comes back closed');
    expect(fake.calls.some((c) => c.method === 'POST')).toBe(false);
    await user.click(within(dialog).getByRole('button', { name: 'Archive' }));

    expect(await screen.findByRole('button', { name: 'Restore' })).toBeInTheDocument();
    expect(screen.getByText(/This project is archived/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Reopen fieldwork' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Set the assignment/ })).toBeNull();
  });
});
