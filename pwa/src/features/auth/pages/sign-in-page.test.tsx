import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json, problem, authResponse } from '../../../test/fake-api';
import { renderApp } from '../../../test/render-app';
import { readSession } from '../../../db/session-store';

describe('sign-in page', () => {
  it('sends a signed-out visitor to the sign-in page', async () => {
    installFakeApi();
    renderApp('/lead');
    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(window.location.pathname).toBe('/sign-in');
  });

  it("shows the server's message for a wrong password and stays signed out", async () => {
    const api = installFakeApi();
    api.on('POST', '/api/auth/login', () => problem(401, 'Unauthorized', 'Wrong e-mail or password.'));
    renderApp('/sign-in');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'lead@vellmoor.example');
    await user.type(screen.getByLabelText('Password'), 'not-the-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Wrong e-mail or password.');
    expect(screen.getByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(await readSession()).toBeUndefined();
  });

  it('tells an address the server cannot take once, at the field, in words of its own', async () => {
    const api = installFakeApi();
    api.on('POST', '/api/auth/login', () =>
      json({ statusCode: 400, error: 'Bad Request', message: 'email must be an e-mail address', fields: [{ field: 'email', message: 'email must be an e-mail address' }] }, 400),
    );
    renderApp('/sign-in');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'x@y.z');
    await user.type(screen.getByLabelText('Password'), 'whatever-it-is');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Not signed in: see the marked field below.');
    expect(screen.getByText('That is not an e-mail address: check it for a typing slip.')).toBeInTheDocument();
    expect(screen.queryByText('email must be an e-mail address')).not.toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('aria-invalid', 'true');
  });

  it('says so, and how long to wait, when there have been too many attempts', async () => {
    const api = installFakeApi();
    api.on('POST', '/api/auth/login', () => {
      const reply = problem(429, 'Too Many Requests', 'Too many failed sign-ins; try again in 2 minutes');
      reply.headers.set('Retry-After', '95');
      return reply;
    });
    renderApp('/sign-in');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'lead@vellmoor.example');
    await user.type(screen.getByLabelText('Password'), 'guess');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Too many failed sign-ins; try again in 2 minutes');
  });

  it('reads the wait from Retry-After when a proxy refuses with no message of its own', async () => {
    const api = installFakeApi();
    api.on('POST', '/api/auth/login', () => new Response('slow down', { status: 429, headers: { 'Retry-After': '600' } }));
    renderApp('/sign-in');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'lead@vellmoor.example');
    await user.type(screen.getByLabelText('Password'), 'guess');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Too many attempts. Please try again in 10 minutes.');
  });

  it('explains that signing in needs the network once when the device is offline', async () => {
    installFakeApi().setNetwork('down');
    renderApp('/sign-in');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'interviewer@vellmoor.example');
    await user.type(screen.getByLabelText('Password'), 'plumbline-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'You are offline: signing in needs the network once; work already on this device is kept.',
    );
  });

  it('signs in and lands on the role home, and the sign-in survives a reload', async () => {
    const api = installFakeApi();
    api.on('POST', '/api/auth/login', () => json(authResponse('lead')));
    api.on('GET', '/api/projects', () => json([]));
    const first = renderApp('/sign-in');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'lead@vellmoor.example');
    await user.type(screen.getByLabelText('Password'), 'plumbline-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Projects' })).toBeInTheDocument();
    expect(window.location.pathname).toBe('/lead');

    first.unmount();
    renderApp('/lead');
    expect(await screen.findByRole('heading', { level: 1, name: 'Projects' })).toBeInTheDocument();
  });
});
