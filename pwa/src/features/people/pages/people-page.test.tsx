import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

describe("admin's people page", () => {
  it("lists the organisation's accounts with their roles", async () => {
    const api = installFakeApi();
    api.on('GET', '/api/users', () =>
      json([
        { id: 'u2', email: 'lead@vellmoor.example', name: 'Lorna Quist', role: 'lead', createdAt: '2026-02-01T09:00:00Z' },
        { id: 'u1', email: 'admin@vellmoor.example', name: 'Ada Brennock', role: 'admin', createdAt: '2026-02-01T09:00:00Z' },
      ]),
    );
    await signedInAs('admin');
    renderApp('/admin');

    const list = await screen.findByRole('list', { name: 'People' });
    const rows = within(list).getAllByRole('listitem');
    expect(rows.map((row) => within(row).getByRole('heading').textContent)).toEqual(['Ada Brennock', 'Lorna Quist']);
    expect(within(rows[1]!).getByText('Project lead')).toBeInTheDocument();
    expect(within(rows[1]!).getByText('lead@vellmoor.example')).toBeInTheDocument();
  });
});
