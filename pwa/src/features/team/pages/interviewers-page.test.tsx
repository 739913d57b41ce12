import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
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
  archivedAt: null,
  mine: null,
};

describe('the supervisor’s interviewers page', () => {
  it('lists the project’s interviewers with their assignments and sets one', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([project]));
    api.on('GET', '/api/projects/p9/members', () =>
      json([
        { id: 'u1', name: 'Alys Fenwick', email: 'a@x', role: 'interviewer' },
        { id: 'u2', name: 'Bram Osei', email: 'b@x', role: 'interviewer' },
        { id: 'u3', name: 'Vellmoor Transit Board', email: 'c@x', role: 'client' },
      ]),
    );
    api.on('GET', '/api/projects/p9/cells', () => json({ variables: [], cells: [], refreshedAt: '2026-12-02T10:00:00Z' }));
    let assignments = [{ userId: 'u1', name: 'Alys Fenwick', target: 60, cellIds: [], completes: 45, updatedAt: '2026-12-02T10:00:00Z' }];
    api.on('GET', '/api/projects/p9/assignments', () => json(assignments));
    api.on('PUT', '/api/projects/p9/assignments/u2', ({ body }) => {
      const row = { userId: 'u2', name: 'Bram Osei', target: (body as { target: number }).target, cellIds: [], completes: 3, updatedAt: '2026-12-02T10:00:00Z' };
      assignments = [...assignments, row];
      return json(row);
    });
    await signedInAs('supervisor');
    renderApp('/supervisor/interviewers');
    const user = userEvent.setup();

    const list = await screen.findByRole('list', { name: 'Assignments' });
    const rows = within(list).getAllByRole('listitem');
    // Interviewers only: the client on the team is not offered an assignment.
    expect(rows.map((row) => within(row).getByText(/Fenwick|Osei/).textContent)).toEqual(['Alys Fenwick', 'Bram Osei']);
    expect(rows[0]).toHaveTextContent('45 of 60 completes; any cell');

    await user.click(within(list).getByRole('button', { name: 'Set the assignment of Bram Osei' }));
    await user.type(screen.getByLabelText('Completes to reach'), '30');
    await user.click(screen.getByRole('button', { name: 'Save assignment' }));
    await within(list).findByText('30');
    expect(within(list).getAllByRole('listitem')[1]).toHaveTextContent('3 of 30 completes; any cell');
    expect(api.calls.find((c) => c.method === 'PUT')?.body).toEqual({ target: 30, cellIds: [] });
  });
});
