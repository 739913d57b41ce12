import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { cell, syncedBefore, tramCells } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';

const me = 'user-interviewer';

afterEach(async () => {
  await whenSyncIdle();
});

describe('the Cells page', () => {
  it('shows the cells from the last sync and asks the office for the latest on a tap', async () => {
    const api = installFakeApi();
    await signedInAs('interviewer');
    await syncedBefore(me);
    const user = userEvent.setup();
    renderApp('/interviewer/cells');
    const button = await screen.findByRole('button', { name: 'Sync now for the latest cells' });
    expect(screen.getByRole('region', { name: 'Cells of Vellmoor tram extension' })).toBeInTheDocument();
    await whenSyncIdle();
    const before = api.calls.length;
    await user.click(button);
    await vi.waitFor(() => expect(api.calls.length).toBeGreaterThan(before));
  });

  it('names the two kinds of cell with the words the lead reads on the set-up page', async () => {
    installFakeApi().setNetwork('down');
    await signedInAs('interviewer');
    const crossed = { ...cell('cell-cross', 'Age band: 18-34 × Region: Mardon', ['c-young', 'c-mardon'], 20, 5), kind: 'interlocked' as const };
    await syncedBefore(me, [...tramCells, crossed]);
    renderApp('/interviewer/cells');

    const interlocked = await screen.findByRole('region', { name: 'Interlocked cells' });
    expect(within(interlocked).getAllByRole('listitem')).toHaveLength(1);
    expect(within(screen.getByRole('region', { name: 'Margin quotas' })).getAllByRole('listitem')).toHaveLength(4);
    expect(screen.queryByText(/Crossed cells|Single-variable cells/)).not.toBeInTheDocument();
  });
});
