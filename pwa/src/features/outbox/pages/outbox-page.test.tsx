import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { db } from '../../../db/plumbline-db';
import { installFakeApi } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

describe('outbox page', () => {
  it('shows that nothing is waiting and that work stays on the device until the office has it', async () => {
    installFakeApi();
    await signedInAs('interviewer');
    renderApp('/interviewer/outbox');

    expect(await screen.findByText('unsent interviews on this device')).toBeInTheDocument();
    expect(screen.getByText('0')).toBeInTheDocument();
    expect(screen.getByText(/kept on this device until the office has it/)).toBeInTheDocument();
  });

  it('counts the unsent interviews stored on the device', async () => {
    installFakeApi();
    await signedInAs('interviewer');
    await db.outbox.add({
      clientId: '2b0c5f6e-1111-4a4a-8b8b-000000000001',
      interviewerId: 'user-interviewer',
      projectId: 'p-tram',
      createdAt: '2026-03-03T10:00:00Z',
      payload: {},
    });
    renderApp('/interviewer/outbox');

    expect(await screen.findByText('unsent interview on this device')).toBeInTheDocument();
    expect(screen.getByText('1')).toBeInTheDocument();
  });
});
