// Correcting mistakes (issue 10, item 5): a contact still on the device can have its answer
// changed or be voided (never sent); one the office already has can be voided with a reason,
// sent through the sync module as a void item like any other outbox item.
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { db, type InterviewRecord } from '../../../db/plumbline-db';
import { installFakeApi, json } from '../../../test/fake-api';
import { completeEntry, syncedBefore, tramCells, tramProject, tramVariables } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';

const me = 'user-interviewer';
const who = { 'v-age': 'c-old', 'v-region': 'c-quay' };

afterEach(async () => {
  await whenSyncIdle();
});

describe('correcting contacts from the outbox', () => {
  it('changes the answer of a waiting complete and voids another, offline, before anything is sent', async () => {
    installFakeApi().setNetwork('down');
    await signedInAs('interviewer');
    await syncedBefore(me);
    const [first, second] = [completeEntry(1, me, who), completeEntry(2, me, who)];
    await db.outbox.bulkAdd([first, second]);
    renderApp('/interviewer/outbox');
    const user = userEvent.setup();

    const list = await screen.findByRole('list', { name: 'Waiting to be sent' });
    const [newest] = within(list).getAllByRole('listitem');
    await user.selectOptions(within(newest!).getByRole('combobox', { name: 'Answer' }), 'Don’t know');
    await waitFor(async () => expect(((await db.outbox.get(second.clientId))!.payload as InterviewRecord).headlineAnswer).toBe('dont_know'));

    const buttons = within(list).getAllByRole('button', { name: 'Void…' });
    await user.click(buttons[1]!);
    const dialog = await screen.findByRole('dialog', { name: 'Void this contact?' });
    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(await db.outbox.count()).toBe(2);
    await user.click(within(list).getAllByRole('button', { name: 'Void…' })[1]!);
    await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Void it' }));
    await waitFor(async () => expect(await db.outbox.get(first.clientId)).toBeUndefined());
    expect(within(screen.getByRole('list', { name: 'Waiting to be sent' })).getAllByRole('listitem')).toHaveLength(1);
    expect(await db.outbox.count()).toBe(1);
  });

  it('voids a sent contact with a reason: the void goes through the sync and the contact shows as voided', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([tramProject]));
    api.on('GET', `/api/projects/${tramProject.id}/cells`, () => json({ variables: tramVariables, cells: tramCells, refreshedAt: '2026-11-21T10:00:00Z' }));
    const sentItems: unknown[] = [];
    api.on('POST', `/api/projects/${tramProject.id}/interviews/sync`, ({ body }) => {
      const items = (body as { interviews: { id: string; kind?: string }[] }).interviews;
      sentItems.push(...items);
      return json({ results: items.map((i) => ({ id: i.id, status: i.kind === 'void' ? 'voided' : 'accepted' })), cells: tramCells });
    });
    await signedInAs('interviewer');
    await syncedBefore(me);
    renderApp('/interviewer/outbox');
    await screen.findByText('Nothing is waiting to be sent.');
    await whenSyncIdle();
    const contact = completeEntry(1, me, who);
    await db.outbox.add(contact);
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Send now' }));
    const sent = await screen.findByRole('list', { name: 'Sent from this device' });
    expect(await db.outbox.count()).toBe(0);

    await user.click(within(sent).getByRole('button', { name: 'Void…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Void a sent contact?' });
    await user.click(within(dialog).getByRole('button', { name: 'Void it' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent('Say why it should not count.');
    expect(await db.outbox.count()).toBe(0);
    await user.type(within(dialog).getByRole('textbox', { name: 'Reason' }), 'Logged twice by mistake');
    await user.click(within(dialog).getByRole('button', { name: 'Void it' }));

    expect(await screen.findByText('Voided: Logged twice by mistake')).toBeInTheDocument();
    await whenSyncIdle();
    await waitFor(() => expect(sentItems).toContainEqual({ kind: 'void', id: contact.clientId, reason: 'Logged twice by mistake' }));
    // The server answered "voided": the void leaves the outbox, the contact stays listed as voided.
    await waitFor(async () => expect(await db.outbox.count()).toBe(0));
    expect(within(screen.getByRole('list', { name: 'Sent from this device' })).queryByRole('button', { name: 'Void…' })).toBeNull();
  });
});
