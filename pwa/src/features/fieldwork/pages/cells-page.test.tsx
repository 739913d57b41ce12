import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { cell, syncedBefore, tramCells } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';

afterEach(async () => {
  await whenSyncIdle();
});

describe("interviewer's cells page", () => {
  it('names the two kinds of cell with the words the lead reads on the set-up page', async () => {
    installFakeApi().setNetwork('down');
    await signedInAs('interviewer');
    const crossed = { ...cell('cell-cross', 'Age band: 18-34 × Region: Mardon', ['c-young', 'c-mardon'], 20, 5), kind: 'interlocked' as const };
    await syncedBefore('user-interviewer', [...tramCells, crossed]);
    renderApp('/interviewer/cells');

    const interlocked = await screen.findByRole('region', { name: 'Interlocked cells' });
    expect(within(interlocked).getAllByRole('listitem')).toHaveLength(1);
    expect(within(screen.getByRole('region', { name: 'Margin quotas' })).getAllByRole('listitem')).toHaveLength(4);
    expect(screen.queryByText(/Crossed cells|Single-variable cells/)).not.toBeInTheDocument();
  });
});
