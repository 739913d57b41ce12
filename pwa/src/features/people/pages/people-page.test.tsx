import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json, problem } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const person = (id: string, name: string, role: string, status = 'active') => ({
  id,
  email: `${name.split(' ')[0]!.toLowerCase()}@vellmoor.example`,
  name,
  role,
  active: status !== 'disabled',
  status,
  createdAt: '2026-02-01T09:00:00Z',
});

describe("admin's people page", () => {
  it("lists the organisation's accounts with their roles and states", async () => {
    const api = installFakeApi();
    api.on('GET', '/api/users', () =>
      json([person('u2', 'Lorna Quist', 'lead'), person('u1', 'Ada Brennock', 'admin'), person('u3', 'Ivo Tarrant', 'interviewer', 'invited')]),
    );
    await signedInAs('admin');
    renderApp('/admin');

    const list = await screen.findByRole('list', { name: 'People' });
    const rows = within(list).getAllByRole('listitem');
    expect(rows.map((row) => within(row).getByRole('heading').textContent)).toEqual(['Ada Brennock', 'Ivo Tarrant', 'Lorna Quist']);
    expect(within(rows[2]!).getByText('Project lead')).toBeInTheDocument();
    expect(within(rows[2]!).getByText('lorna@vellmoor.example')).toBeInTheDocument();
    expect(within(rows[1]!).getByText(/Invited/)).toBeInTheDocument();
  });

  it('invites a person by e-mail with a role and shows the server’s field problems', async () => {
    const api = installFakeApi();
    let people = [person('u1', 'Ada Brennock', 'admin')];
    api.on('GET', '/api/users', () => json(people));
    api.on('POST', '/api/users/invitations', ({ body }) => {
      const b = body as { email: string; name: string; role: string };
      if (b.email === 'lead@vellmoor.example') {
        return json({ statusCode: 409, error: 'Conflict', message: 'That e-mail address already has an account', fields: [{ field: 'email', message: 'already in use' }] }, 409);
      }
      const created = { ...person('u9', b.name, b.role, 'invited'), email: b.email };
      people = [...people, created];
      return json(created, 201);
    });
    await signedInAs('admin');
    renderApp('/admin');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Invite a person' }));
    const dialog = screen.getByRole('dialog', { name: 'Invite a person' });
    await user.type(within(dialog).getByLabelText('Name'), 'Sefa Okoro');
    await user.type(within(dialog).getByLabelText('E-mail'), 'lead@vellmoor.example');
    await user.selectOptions(within(dialog).getByLabelText('Role'), 'Supervisor');
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));
    expect(await within(dialog).findByText('already in use')).toBeInTheDocument();

    await user.clear(within(dialog).getByLabelText('E-mail'));
    await user.type(within(dialog).getByLabelText('E-mail'), 'sefa@vellmoor.example');
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText(/Invitation sent to sefa@vellmoor.example/)).toHaveAttribute('role', 'status');
    expect(api.calls.filter((c) => c.path === '/api/users/invitations').at(-1)!.body).toEqual({ name: 'Sefa Okoro', email: 'sefa@vellmoor.example', role: 'supervisor' });
    const list = await screen.findByRole('list', { name: 'People' });
    expect(await within(list).findByText('Sefa Okoro')).toBeInTheDocument();
  });

  it('changes a role and disables an account, saying what happened; an error is shown in words', async () => {
    const api = installFakeApi();
    let lorna = person('u2', 'Lorna Quist', 'lead');
    api.on('GET', '/api/users', () => json([person('u1', 'Ada Brennock', 'admin'), lorna]));
    api.on('PATCH', '/api/users/u2/role', ({ body }) => json((lorna = { ...lorna, role: (body as { role: string }).role })));
    api.on('POST', '/api/users/u2/disable', () => json((lorna = { ...lorna, active: false, status: 'disabled' })));
    api.on('POST', '/api/users/u2/password-reset', () => problem(409, 'Conflict', "Lorna Quist's account is disabled; enable it first"));
    await signedInAs('admin');
    renderApp('/admin');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Manage Lorna Quist' }));
    const dialog = screen.getByRole('dialog', { name: 'Lorna Quist' });
    await user.selectOptions(within(dialog).getByLabelText('Role'), 'Supervisor');
    await user.click(within(dialog).getByRole('button', { name: 'Change role' }));
    expect(await within(dialog).findByRole('status')).toHaveTextContent('Lorna Quist is now Supervisor.');

    await user.click(within(dialog).getByRole('button', { name: 'Send a password reset' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent('enable it first');
    await user.click(within(dialog).getByRole('button', { name: 'Disable account' }));
    expect(await within(dialog).findByText(/can no longer sign in/)).toBeInTheDocument();
    expect(await within(dialog).findByRole('button', { name: 'Enable account' })).toBeInTheDocument();
  });
});
