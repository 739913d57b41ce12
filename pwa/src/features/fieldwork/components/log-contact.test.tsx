import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, type InterviewRecord } from '../../../db/plumbline-db';
import { installFakeApi } from '../../../test/fake-api';
import { cell, completeEntry, syncedBefore, tramCells, tramProject } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';

const me = 'user-interviewer';

beforeEach(async () => {
  // Offline (the network cut, whatever the browser claims): the screen must work from the device alone.
  installFakeApi().setNetwork('down');
  await signedInAs('interviewer');
});

afterEach(async () => {
  await whenSyncIdle();
});

async function startComplete(age: string, region: string) {
  const user = userEvent.setup();
  renderApp('/interviewer');
  await user.click(await screen.findByRole('button', { name: 'Log a contact for Vellmoor tram extension' }));
  expect(screen.getByText(/Record no names, addresses or phone numbers/)).toBeInTheDocument();
  await user.click(screen.getByRole('radio', { name: 'Complete' }));
  await user.click(within(screen.getByRole('radiogroup', { name: 'Age band' })).getByRole('radio', { name: age }));
  await user.click(within(screen.getByRole('radiogroup', { name: 'Region' })).getByRole('radio', { name: region }));
  await user.click(screen.getByRole('button', { name: 'Check their cells' }));
  return user;
}

describe('logging a contact', () => {
  it('asks for confirmation before an interview in a full cell, then saves it to the outbox', async () => {
    await syncedBefore(me, [cell('cell-young', 'age_band: 18-34', ['c-young'], 50, 50), ...tramCells.slice(1)]);
    const user = await startComplete('18-34', 'Mardon');

    expect(screen.getByRole('alert')).toHaveTextContent('One of their cells is full or closed');
    await user.click(screen.getByRole('button', { name: 'Start the interview' }));
    const dialog = await screen.findByRole('dialog', { name: 'Their cell is full' });
    expect(dialog).toHaveTextContent('age band: 18-34 is full');
    expect(dialog).toHaveTextContent('counted as over quota');
    // The safe choice is the main one; interviewing anyway is the quiet one.
    expect(within(dialog).getByRole('button', { name: 'Go back' })).toHaveClass('pl-button-main');
    expect(within(dialog).getByRole('button', { name: 'Interview anyway' })).toHaveClass('pl-button-quiet');
    await user.click(within(dialog).getByRole('button', { name: 'Interview anyway' }));

    expect(screen.getByText('Do you support extending the tram line?')).toBeInTheDocument();
    const answers = screen.getByRole('radiogroup', { name: 'Do you support extending the tram line?' });
    expect(within(answers).getAllByRole('radio').map((r) => r.textContent)).toEqual(['Yes', 'No', 'Don’t know', 'No answer']);
    await user.click(screen.getByRole('radio', { name: 'Yes' }));
    await user.click(screen.getByRole('button', { name: 'Save interview' }));

    expect(await screen.findByText(/Complete saved on this device/)).toBeInTheDocument();
    const [entry] = await db.outbox.toArray();
    const record = entry!.payload as InterviewRecord;
    expect(record).toMatchObject({ disposition: 'complete', categories: { 'v-age': 'c-young', 'v-region': 'c-mardon' }, headlineAnswer: 'yes' });
    expect(record.id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(Date.parse(record.endedAt)).toBeGreaterThanOrEqual(Date.parse(record.startedAt));
    expect(Object.keys(record).sort()).toEqual(['categories', 'disposition', 'endedAt', 'headlineAnswer', 'id', 'startedAt']);
  });

  it('counts this device’s unsent completes: the last place taken offline makes the cell full', async () => {
    await syncedBefore(me); // 18-34 has one place left at the last sync
    await db.outbox.add(completeEntry(1, me, { 'v-age': 'c-young', 'v-region': 'c-quay' }));
    const user = await startComplete('18-34', 'Mardon');

    const theirCells = screen.getByRole('list', { name: 'The respondent’s cells' });
    expect(within(theirCells).getByText('Full')).toBeInTheDocument();
    expect(within(theirCells).getAllByRole('listitem')[0]).toHaveTextContent('age band: 18-34Full0 of 50 left');
    await user.click(screen.getByRole('button', { name: 'Start the interview' }));
    expect(await screen.findByRole('dialog', { name: 'Their cell is full' })).toBeInTheDocument();
  });

  it('goes straight to the headline question when the respondent’s cells are open', async () => {
    await syncedBefore(me);
    const user = await startComplete('35+', 'Old Quay');

    expect(screen.getByText('All their cells are open.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Start the interview' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(screen.getByText('Do you support extending the tram line?')).toBeInTheDocument();
  });

  it('saves a refusal in two taps, with no categories or answer', async () => {
    await syncedBefore(me);
    const user = userEvent.setup();
    renderApp('/interviewer');
    await user.click(await screen.findByRole('button', { name: 'Log a contact for Vellmoor tram extension' }));
    await user.click(screen.getByRole('radio', { name: 'Refusal' }));
    await user.click(screen.getByRole('button', { name: 'Save refusal' }));

    expect(await screen.findByText(/Refusal saved on this device/)).toBeInTheDocument();
    expect(screen.getByText(/goes to the office when the network is back/)).toBeInTheDocument();
    const [entry] = await db.outbox.toArray();
    expect(Object.keys(entry!.payload as object).sort()).toEqual(['disposition', 'endedAt', 'id', 'startedAt']);
    expect(entry!.interviewerId).toBe(me);
  });

  it('records the categories seen at a partial, if the interviewer gives any, and no answer', async () => {
    await syncedBefore(me);
    const user = userEvent.setup();
    renderApp('/interviewer');
    await user.click(await screen.findByRole('button', { name: 'Log a contact for Vellmoor tram extension' }));
    await user.click(screen.getByRole('radio', { name: 'Partial' }));
    expect(screen.getByRole('group', { name: 'What could you see? (optional)' })).toBeInTheDocument();
    await user.click(within(screen.getByRole('radiogroup', { name: 'Age band' })).getByRole('radio', { name: '35+' }));
    // Tapping a chosen category again clears it: the interviewer was not sure after all.
    await user.click(within(screen.getByRole('radiogroup', { name: 'Region' })).getByRole('radio', { name: 'Mardon' }));
    await user.click(within(screen.getByRole('radiogroup', { name: 'Region' })).getByRole('radio', { name: 'Mardon' }));
    await user.click(screen.getByRole('button', { name: 'Save partial' }));

    expect(await screen.findByText(/Partial saved on this device/)).toBeInTheDocument();
    const [entry] = await db.outbox.toArray();
    expect(entry!.payload).toMatchObject({ disposition: 'partial', categories: { 'v-age': 'c-old' } });
    expect(Object.keys(entry!.payload as object).sort()).toEqual(['categories', 'disposition', 'endedAt', 'id', 'startedAt']);
  });
});

describe('a contact left half logged', () => {
  it('opens again at the same step with the same answers after the app restarts', async () => {
    await syncedBefore(me);
    const user = await startComplete('35+', 'Old Quay');
    await user.click(screen.getByRole('button', { name: 'Start the interview' }));
    await user.click(screen.getByRole('radio', { name: 'No' }));
    await vi.waitFor(async () => expect((await db.drafts.get(me))?.headlineAnswer).toBe('no'));
    const startedAt = (await db.drafts.get(me))!.startedAt;

    // A reload or a crash: everything on screen goes, the device's storage stays.
    cleanup();
    renderApp('/interviewer');

    expect(await screen.findByText('Do you support extending the tram line?')).toBeInTheDocument();
    expect(screen.getByRole('radio', { name: 'No' })).toBeChecked();
    await user.click(screen.getByRole('button', { name: 'Save interview' }));
    expect(await screen.findByText(/Complete saved on this device/)).toBeInTheDocument();
    const [entry] = await db.outbox.toArray();
    expect(entry!.payload).toMatchObject({ categories: { 'v-age': 'c-old', 'v-region': 'c-quay' }, headlineAnswer: 'no', startedAt });
    expect(await db.drafts.count()).toBe(0);
  });

  it('asks whether to finish or discard a contact started more than a day ago', async () => {
    await syncedBefore(me);
    const twoDaysAgo = new Date(Date.now() - 2 * 24 * 3600 * 1000).toISOString();
    await db.drafts.put({
      interviewerId: me,
      projectId: tramProject.id,
      step: 'check',
      disposition: 'complete',
      categories: { 'v-age': 'c-young', 'v-region': 'c-mardon' },
      startedAt: twoDaysAgo,
      updatedAt: twoDaysAgo,
    });
    const user = userEvent.setup();
    renderApp('/interviewer');

    const prompt = await screen.findByRole('region', { name: 'Unfinished contact' });
    expect(prompt).toHaveTextContent('A complete started');
    expect(prompt).toHaveTextContent('for Vellmoor tram extension was not saved');
    await user.click(within(prompt).getByRole('button', { name: 'Finish it' }));
    expect(await screen.findByRole('list', { name: 'The respondent’s cells' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Cancel' }));

    expect(await screen.findByRole('button', { name: 'Log a contact for Vellmoor tram extension' })).toBeInTheDocument();
    expect(await db.drafts.count()).toBe(0);
    expect(await db.outbox.count()).toBe(0);
  });

  it('discards an old unfinished contact on request and saves nothing', async () => {
    await syncedBefore(me);
    const old = new Date(Date.now() - 30 * 3600 * 1000).toISOString();
    await db.drafts.put({ interviewerId: me, projectId: tramProject.id, step: 'confirm', disposition: 'refusal', categories: {}, startedAt: old, updatedAt: old });
    const user = userEvent.setup();
    renderApp('/interviewer');

    const prompt = await screen.findByRole('region', { name: 'Unfinished contact' });
    expect(prompt).toHaveTextContent('A refusal started');
    await user.click(within(prompt).getByRole('button', { name: 'Discard it' }));

    expect(await screen.findByRole('button', { name: 'Log a contact for Vellmoor tram extension' })).toBeInTheDocument();
    expect(await db.drafts.count()).toBe(0);
    expect(await db.outbox.count()).toBe(0);
  });
});
