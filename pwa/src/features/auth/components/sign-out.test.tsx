import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { db } from '../../../db/plumbline-db';
import { readSession } from '../../../db/session-store';
import { countUnsent } from '../../../db/outbox-store';
import { installFakeApi } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

async function addUnsentInterviews(count: number, interviewerId = 'user-interviewer', first = 0) {
  for (let i = first; i < first + count; i += 1) {
    await db.outbox.add({
      clientId: `7d1f0c1e-0000-4000-8000-00000000000${i}`,
      interviewerId,
      projectId: 'project-vellmoor',
      createdAt: new Date(2026, 2, 2, 10, i).toISOString(),
      payload: { cell: 'age 18-34 × female', outcome: 'complete' },
    });
  }
}

describe('signing out', () => {
  it('warns that unsent interviews stay on the device, signs out, and keeps them', async () => {
    const api = installFakeApi();
    api.on('POST', '/api/auth/logout', () => new Response(null, { status: 204 }));
    await signedInAs('interviewer');
    await addUnsentInterviews(2);
    renderApp('/interviewer/outbox');
    const user = userEvent.setup();

    expect(await screen.findByText('2')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Account: Ines Marr' }));
    const account = await screen.findByRole('dialog', { name: 'Account' });
    expect(within(account).getByText('Ines Marr')).toBeInTheDocument();
    expect(within(account).getByText('Interviewer · Vellmoor Social Research')).toBeInTheDocument();
    await user.click(within(account).getByRole('button', { name: 'Sign out' }));

    const confirm = await screen.findByRole('dialog', { name: 'Sign out of Plumbline?' });
    expect(confirm).toHaveTextContent(
      '2 unsent interviews will stay on this device. They will be sent after Ines Marr signs in again on this device.',
    );
    await user.click(within(confirm).getByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(api.calls).toContainEqual(
      expect.objectContaining({ method: 'POST', path: '/api/auth/logout', body: { refreshToken: 'refresh-interviewer-1' } }),
    );
    expect(await readSession()).toBeUndefined();
    expect(await countUnsent()).toBe(2);
  });

  it('signs out even when the network is gone, still keeping the outbox', async () => {
    installFakeApi().setNetwork('down');
    await signedInAs('interviewer');
    await addUnsentInterviews(1);
    renderApp('/interviewer');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Account: Ines Marr' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Account' })).getByRole('button', { name: 'Sign out' }));
    const confirm = await screen.findByRole('dialog', { name: 'Sign out of Plumbline?' });
    expect(confirm).toHaveTextContent('1 unsent interview will stay on this device.');
    await user.click(within(confirm).getByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(await countUnsent()).toBe(1);
  });

  it('counts only the signed-in interviewer’s own waiting interviews, and keeps everyone’s', async () => {
    installFakeApi().setNetwork('down');
    await signedInAs('interviewer');
    await addUnsentInterviews(2);
    await addUnsentInterviews(3, 'user-someone-else', 2);
    renderApp('/interviewer');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Account: Ines Marr' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Account' })).getByRole('button', { name: 'Sign out' }));
    const confirm = await screen.findByRole('dialog', { name: 'Sign out of Plumbline?' });
    expect(confirm).toHaveTextContent('2 unsent interviews will stay on this device.');
    await user.click(within(confirm).getByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(await countUnsent()).toBe(5);
  });

  it('can be called off, leaving the person signed in', async () => {
    installFakeApi();
    await signedInAs('lead');
    renderApp('/lead/balance');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Account: Lorna Quist' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Account' })).getByRole('button', { name: 'Sign out' }));
    const confirm = await screen.findByRole('dialog', { name: 'Sign out of Plumbline?' });
    expect(confirm).toHaveTextContent('Nothing is waiting to be sent from this device.');
    await user.click(within(confirm).getByRole('button', { name: 'Stay signed in' }));

    expect(screen.queryByRole('dialog', { name: 'Sign out of Plumbline?' })).not.toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 1, name: 'Balance' })).toBeInTheDocument();
    expect(await readSession()).toBeDefined();
  });
});
