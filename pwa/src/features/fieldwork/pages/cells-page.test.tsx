import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { installFakeApi, type FakeApi } from '../../../test/fake-api';
import { syncedBefore } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';

const me = 'user-interviewer';
let api: FakeApi;

beforeEach(async () => {
  api = installFakeApi();
  await signedInAs('interviewer');
  await syncedBefore(me);
});

afterEach(async () => {
  await whenSyncIdle();
});

describe('the Cells page', () => {
  it('shows the cells from the last sync and asks the office for the latest on a tap', async () => {
    const user = userEvent.setup();
    renderApp('/interviewer/cells');
    const button = await screen.findByRole('button', { name: 'Sync now for the latest cells' });
    expect(screen.getByRole('region', { name: 'Cells of Vellmoor tram extension' })).toBeInTheDocument();
    await whenSyncIdle();
    const before = api.calls.length;
    await user.click(button);
    await vi.waitFor(() => expect(api.calls.length).toBeGreaterThan(before));
  });
});
