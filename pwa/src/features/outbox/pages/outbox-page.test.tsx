import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { db } from '../../../db/plumbline-db';
import { installFakeApi, json } from '../../../test/fake-api';
import { completeEntry, syncedBefore, tramCells, tramProject, tramVariables } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';

const me = 'user-interviewer';
const who = { 'v-age': 'c-old', 'v-region': 'c-quay' };

afterEach(async () => {
  await whenSyncIdle();
});

describe('outbox page', () => {
  it('shows that nothing is waiting and that work stays on the device until the office has it', async () => {
    installFakeApi().setNetwork('down');
    await signedInAs('interviewer');
    renderApp('/interviewer/outbox');

    expect(await screen.findByText('unsent interviews on this device')).toBeInTheDocument();
    expect(screen.getByText('0')).toBeInTheDocument();
    expect(screen.getByText(/kept on this device until the office has it/)).toBeInTheDocument();
    expect(screen.getByText('Nothing is waiting to be sent.')).toBeInTheDocument();
  });

  it('lists what waits, offline, with outcome and project, and leaves another person’s entries alone', async () => {
    installFakeApi().setNetwork('down');
    await signedInAs('interviewer');
    await syncedBefore(me);
    await db.outbox.bulkAdd([completeEntry(1, me, who), completeEntry(2, me, who), completeEntry(3, 'user-other', who)]);
    renderApp('/interviewer/outbox');

    expect(await screen.findByText('unsent interviews on this device')).toBeInTheDocument();
    const list = screen.getByRole('list', { name: 'Waiting to be sent' });
    expect(within(list).getAllByRole('listitem')).toHaveLength(2);
    expect(within(list).getAllByText('Complete')).toHaveLength(2);
    expect(within(list).getAllByText('Vellmoor tram extension')).toHaveLength(2);
    expect(screen.getByText(/1 more contact was logged on this device by someone else/)).toBeInTheDocument();
    expect(await screen.findByText(/The office cannot be reached right now/)).toBeInTheDocument();

    // Send now still tries (the browser's online flag is not trusted); with the network cut it keeps everything.
    await userEvent.setup().click(screen.getByRole('button', { name: 'Send now' }));
    await whenSyncIdle();
    expect(screen.getByText(/Nothing is lost: unsent interviews stay here/)).toBeInTheDocument();
    expect(await screen.findByText(/Office not reachable since \d\d:\d\d/)).toBeInTheDocument();
    expect(await db.outbox.count()).toBe(3);
  });

  it('sends on demand, then shows the refused entry with its reason until it is discarded on purpose', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([tramProject]));
    api.on('GET', `/api/projects/${tramProject.id}/cells`, () => json({ variables: tramVariables, cells: tramCells, refreshedAt: '2026-11-21T10:00:00Z' }));
    const refused = completeEntry(2, me, who);
    api.on('POST', `/api/projects/${tramProject.id}/interviews/sync`, ({ body }) => {
      const ids = (body as { interviews: { id: string }[] }).interviews.map((i) => i.id);
      return json({
        results: ids.map((id) => (id === refused.clientId ? { id, status: 'rejected', reason: 'Region: no category given' } : { id, status: 'accepted' })),
        cells: tramCells,
      });
    });
    await signedInAs('interviewer');
    await syncedBefore(me);
    renderApp('/interviewer/outbox');
    await screen.findByText('Nothing is waiting to be sent.');
    await whenSyncIdle();
    await db.outbox.bulkAdd([completeEntry(1, me, who), refused]);
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Send now' }));

    expect(await screen.findByText('Reason: Region: no category given')).toBeInTheDocument();
    expect(screen.getByText(/Last successful sync:/)).toHaveTextContent(/today \d\d:\d\d/);
    expect(screen.getByRole('heading', { name: 'Refused by the server (1)' })).toBeInTheDocument();
    expect(await db.outbox.count()).toBe(1);

    await user.click(screen.getByRole('button', { name: 'Discard…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Discard this contact?' });
    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(await db.outbox.count()).toBe(1);

    await user.click(screen.getByRole('button', { name: 'Discard…' }));
    await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Discard' }));
    await waitFor(() => expect(screen.queryByText(/Refused by the server/)).not.toBeInTheDocument());
    expect(screen.getByText('Nothing is waiting to be sent.')).toBeInTheDocument();
    expect(await db.outbox.count()).toBe(0);
  });
});
