import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { authResponse, installFakeApi, json, problem } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const tram = {
  id: 'p-tram',
  name: 'Vellmoor tram extension',
  topic: 'Support for the proposed tram extension',
  fieldStart: '2026-03-02T00:00:00.000Z',
  fieldEnd: '2026-03-22',
  targetSize: 1200,
  status: 'fieldwork',
};

describe("lead's projects page", () => {
  it('lists the projects the server returns with their dates and target sample', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([tram]));
    await signedInAs('lead');
    renderApp('/lead');

    expect(await screen.findByRole('heading', { level: 2, name: 'Vellmoor tram extension' })).toBeInTheDocument();
    expect(screen.getByText('2 Mar 2026 – 22 Mar 2026')).toBeInTheDocument();
    expect(screen.getByText((_, element) => element?.tagName === 'DD' && element.textContent === '1,200 interviews')).toBeInTheDocument();
    expect(api.calls.find((c) => c.path === '/api/projects')?.authorization).toBe('Bearer access-lead-1');
  });

  it('says plainly when there are no projects yet', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([]));
    await signedInAs('lead');
    renderApp('/lead');

    expect(await screen.findByRole('heading', { name: 'No projects yet' })).toBeInTheDocument();
  });

  it("shows the server's error and loads again on request", async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => problem(503, 'Service Unavailable', 'The database is not reachable.'));
    await signedInAs('lead');
    renderApp('/lead');

    expect(await screen.findByRole('alert')).toHaveTextContent('The database is not reachable.');
    api.on('GET', '/api/projects', () => json([tram]));
    await userEvent.setup().click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('heading', { level: 2, name: 'Vellmoor tram extension' })).toBeInTheDocument();
  });

  it('says the list needs the network when the device is offline', async () => {
    installFakeApi().setNetwork('down');
    await signedInAs('lead');
    renderApp('/lead');

    expect(await screen.findByRole('heading', { name: 'You are offline' })).toBeInTheDocument();
    expect(screen.getByText(/project list needs the network/)).toBeInTheDocument();
    expect(screen.getByText('Offline')).toBeInTheDocument();
  });
});

describe('an ended sign-in', () => {
  it('takes the person to the sign-in page when the server refuses the refresh', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => problem(401, 'Unauthorized', 'Access token expired.'));
    api.on('POST', '/api/auth/refresh', () => problem(401, 'Unauthorized', 'Refresh token expired.'));
    await signedInAs('lead');
    renderApp('/lead');

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(window.location.pathname).toBe('/sign-in');
  });
});

describe('another person on the same device', () => {
  it('never sees the projects loaded for the person whose sign-in ended', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([tram]));
    await signedInAs('lead');
    const { queryClient } = renderApp('/lead');
    await screen.findByRole('heading', { level: 2, name: 'Vellmoor tram extension' });

    // The sign-in ends on the server; the next refresh of the list finds out.
    api.on('GET', '/api/projects', () => problem(401, 'Unauthorized', 'Access token expired.'));
    api.on('POST', '/api/auth/refresh', () => problem(401, 'Unauthorized', 'Refresh token expired.'));
    await queryClient.refetchQueries();
    await screen.findByRole('heading', { level: 1, name: 'Sign in' });

    api.on('POST', '/api/auth/login', () =>
      json({ ...authResponse('lead', '2'), user: { ...authResponse('lead').user, id: 'user-lead-2', name: 'Other Lead' } }),
    );
    // Their list is still on its way: nothing of the person before may fill the wait.
    api.on('GET', '/api/projects', () => new Promise<Response>(() => {}));
    const user = userEvent.setup();
    await user.type(screen.getByLabelText('E-mail'), 'other-lead@vellmoor.example');
    await user.type(screen.getByLabelText('Password'), 'plumbline-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Projects' })).toBeInTheDocument();
    expect(screen.getByText('Loading projects…')).toBeInTheDocument();
    expect(screen.queryByText('Vellmoor tram extension')).not.toBeInTheDocument();
  });
});
