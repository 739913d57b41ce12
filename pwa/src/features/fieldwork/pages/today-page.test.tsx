import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db, type FieldProject } from '../../../db/plumbline-db';
import { installFakeApi } from '../../../test/fake-api';
import { completeEntry, syncedBefore, tramProject } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';
import { dayIn } from '../own-progress';

const me = 'user-interviewer';
const today = () => dayIn(tramProject.timeZone, new Date());

/** What the last sync left on the device: the project with the interviewer's own figures. */
async function syncedWith(mine: FieldProject['mine']) {
  await syncedBefore(me);
  await db.projectCache.update([me, tramProject.id], { project: { ...tramProject, mine } });
}

/** A contact still in the outbox, ended a minute ago. */
function unsentNow(n: number, disposition: 'complete' | 'refusal', categories: Record<string, string> = {}) {
  const at = new Date(Date.now() - 60_000).toISOString();
  const entry = completeEntry(n, me, categories);
  return { ...entry, createdAt: at, payload: { ...(entry.payload as object), disposition, startedAt: at, endedAt: at } };
}

beforeEach(async () => {
  // Offline: everything below comes from the device.
  installFakeApi().setNetwork('down');
  await signedInAs('interviewer');
});

afterEach(async () => {
  await whenSyncIdle();
  cleanup();
});

describe('Today: the interviewer’s own progress, offline', () => {
  it('shows completes against the assignment, today’s contacts and completes and the assigned cells, with unsent contacts counted', async () => {
    await syncedWith({ fieldDay: today(), todayContacts: 2, todayCompletes: 1, completes: 10, assignment: { target: 40, cellIds: ['cell-young', 'cell-quay'] } });
    await db.outbox.bulkPut([unsentNow(1, 'complete', { 'v-age': 'c-young', 'v-region': 'c-mardon' }), unsentNow(2, 'refusal')]);
    renderApp('/interviewer');

    const work = await screen.findByRole('region', { name: 'Your work' });
    expect(work).toHaveTextContent('11 of 40 completes, 29 to go');
    expect(within(work).getByRole('progressbar', { name: 'Your completes on Vellmoor tram extension' })).toHaveAttribute('value', '11');
    expect(work).toHaveTextContent('Today: 4 contacts, 2 completes');
    const cells = within(work).getByRole('list', { name: 'Your cells on Vellmoor tram extension' });
    const rows = within(cells).getAllByRole('listitem');
    expect(rows.map((row) => row.textContent)).toEqual([
      // 49 synced + this device's unsent complete: the cell is now full.
      expect.stringMatching(/^age band: 18-34Full0 of 50 left$/),
      expect.stringMatching(/^region: Old QuayOpen40 of 50 left$/),
    ]);
  });

  it('does not take yesterday’s figures from the last sync for today’s', async () => {
    await syncedWith({ fieldDay: '2020-01-01', todayContacts: 7, todayCompletes: 5, completes: 12, assignment: null });
    renderApp('/interviewer');
    const work = await screen.findByRole('region', { name: 'Your work' });
    expect(work).toHaveTextContent('12 completes so far (no target of your own)');
    expect(work).toHaveTextContent('Today: 0 contacts, 0 completes');
    expect(within(work).queryByRole('progressbar')).toBeNull();
  });

  it('says gently that a respondent is outside the interviewer’s cells, and lets them go on', async () => {
    await syncedWith({ fieldDay: today(), todayContacts: 0, todayCompletes: 0, completes: 0, assignment: { target: 5, cellIds: ['cell-young'] } });
    const user = userEvent.setup();
    renderApp('/interviewer');
    await user.click(await screen.findByRole('button', { name: 'Log a contact for Vellmoor tram extension' }));
    await user.click(screen.getByRole('radio', { name: 'Complete' }));
    await user.click(within(screen.getByRole('radiogroup', { name: 'Age band' })).getByRole('radio', { name: '35+' }));
    await user.click(within(screen.getByRole('radiogroup', { name: 'Region' })).getByRole('radio', { name: 'Mardon' }));
    await user.click(screen.getByRole('button', { name: 'Check their cells' }));
    expect(screen.getByRole('note')).toHaveTextContent('outside the cells you were given. You can still interview them');
    await user.click(screen.getByRole('button', { name: 'Start the interview' }));
    expect(screen.getByText('Do you support extending the tram line?')).toBeInTheDocument();
  });
});
