// The outcomes the office's rates need told apart: turned away because the cell is full, and
// whether someone eligible is known to live where nobody was reached.
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db } from '../../../db/plumbline-db';
import { installFakeApi } from '../../../test/fake-api';
import { cell, syncedBefore, tramCells } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';

const me = 'user-interviewer';

beforeEach(async () => {
  installFakeApi().setNetwork('down');
  await signedInAs('interviewer');
});

afterEach(async () => {
  await whenSyncIdle();
  cleanup();
});

async function openLog() {
  const user = userEvent.setup();
  renderApp('/interviewer');
  await user.click(await screen.findByRole('button', { name: 'Log a contact for Vellmoor tram extension' }));
  return user;
}

describe('outcomes for the office’s rates', () => {
  it('logs a respondent whose cell is full as turned away, with their categories and no answer', async () => {
    await syncedBefore(me, [cell('cell-young', 'age_band: 18-34', ['c-young'], 50, 50), ...tramCells.slice(1)]);
    const user = await openLog();
    await user.click(screen.getByRole('radio', { name: 'Complete' }));
    await user.click(within(screen.getByRole('radiogroup', { name: 'Age band' })).getByRole('radio', { name: '18-34' }));
    await user.click(within(screen.getByRole('radiogroup', { name: 'Region' })).getByRole('radio', { name: 'Mardon' }));
    await user.click(screen.getByRole('button', { name: 'Check their cells' }));
    await user.click(screen.getByRole('button', { name: 'Turn away: cell full' }));

    expect(await screen.findByText(/Turned away: cell full saved on this device/)).toBeInTheDocument();
    const [entry] = await db.outbox.toArray();
    expect(entry!.payload).toMatchObject({ disposition: 'quota_full', categories: { 'v-age': 'c-young', 'v-region': 'c-mardon' } });
    expect(Object.keys(entry!.payload as object).sort()).toEqual(['categories', 'disposition', 'endedAt', 'id', 'startedAt']);
    // Nothing half-logged is left to resume.
    expect(await db.drafts.count()).toBe(0);
  });

  it('offers no turning away when the respondent’s cells are open', async () => {
    await syncedBefore(me);
    const user = await openLog();
    await user.click(screen.getByRole('radio', { name: 'Complete' }));
    await user.click(within(screen.getByRole('radiogroup', { name: 'Age band' })).getByRole('radio', { name: '35+' }));
    await user.click(within(screen.getByRole('radiogroup', { name: 'Region' })).getByRole('radio', { name: 'Old Quay' }));
    await user.click(screen.getByRole('button', { name: 'Check their cells' }));
    expect(screen.queryByRole('button', { name: 'Turn away: cell full' })).not.toBeInTheDocument();
  });

  it('asks at a non-contact whether someone eligible lives there, and saves the answer', async () => {
    await syncedBefore(me);
    const user = await openLog();
    await user.click(screen.getByRole('radio', { name: 'Non-contact' }));
    const question = screen.getByRole('radiogroup', { name: 'Does someone in the survey’s population live here?' });
    await user.click(within(question).getByRole('radio', { name: 'Yes' }));
    await user.click(screen.getByRole('button', { name: 'Save non-contact' }));

    expect(await screen.findByText(/Non-contact saved on this device/)).toBeInTheDocument();
    const [entry] = await db.outbox.toArray();
    expect(entry!.payload).toMatchObject({ disposition: 'non_contact', eligibilityKnown: true });
  });

  it('leaves eligibility out when the interviewer does not answer', async () => {
    await syncedBefore(me);
    const user = await openLog();
    await user.click(screen.getByRole('radio', { name: 'Other' }));
    await user.click(screen.getByRole('button', { name: 'Save other' }));
    await screen.findByText(/Other saved on this device/);
    const [entry] = await db.outbox.toArray();
    expect(Object.keys(entry!.payload as object).sort()).toEqual(['disposition', 'endedAt', 'id', 'startedAt']);
  });
});
