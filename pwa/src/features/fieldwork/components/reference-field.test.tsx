import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db, type InterviewRecord } from '../../../db/plumbline-db';
import { installFakeApi } from '../../../test/fake-api';
import { syncedBefore } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';

const me = 'user-interviewer';

beforeEach(async () => {
  installFakeApi().setNetwork('down');
  await signedInAs('interviewer');
});

afterEach(async () => {
  await whenSyncIdle();
});

describe('the contact-sheet reference on a complete', () => {
  it('is offered with its privacy hint, refuses a phone number and saves a code', async () => {
    await syncedBefore(me);
    const user = userEvent.setup();
    renderApp('/interviewer');
    await user.click(await screen.findByRole('button', { name: 'Log a contact for Vellmoor tram extension' }));
    await user.click(screen.getByRole('radio', { name: 'Complete' }));
    await user.click(screen.getByRole('radio', { name: '35+' }));
    await user.click(screen.getByRole('radio', { name: 'Old Quay' }));
    await user.click(screen.getByRole('button', { name: 'Check their cells' }));
    await user.click(screen.getByRole('button', { name: 'Start the interview' }));
    await user.click(screen.getByRole('radio', { name: 'Yes' }));

    const field = screen.getByLabelText('Contact-sheet reference (optional)');
    expect(field).toHaveAccessibleDescription(/A code from your contact sheet — never a name, address or phone number/);
    await user.type(field, '07700900123');
    await user.click(screen.getByRole('button', { name: 'Save interview' }));
    expect(screen.getByRole('alert')).toHaveTextContent('This looks like a phone number');
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(await db.outbox.count()).toBe(0);

    await user.clear(field);
    await user.type(field, 'VM-0412');
    await user.click(screen.getByRole('button', { name: 'Save interview' }));
    expect(await screen.findByText(/Complete saved on this device/)).toBeInTheDocument();
    const [entry] = await db.outbox.toArray();
    expect((entry!.payload as InterviewRecord).respondentReference).toBe('VM-0412');
  });
});
