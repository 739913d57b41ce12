import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { authResponse, installFakeApi, json, problem } from '../../../test/fake-api';
import { renderApp } from '../../../test/render-app';
import { readSession } from '../../../db/session-store';

const TOKEN = '0b7c2d3e-1111-4aaa-8bbb-123456789abc.abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQ';

describe('set-password page (the link in an invitation or reset e-mail)', () => {
  it('greets the invited person, refuses a weak password with the server’s words, then signs them in', async () => {
    const api = installFakeApi();
    api.on('POST', '/api/account/link', () => json({ purpose: 'invitation', email: 'interviewer@vellmoor.example', name: 'Ivo Tarrant', organisation: 'Vellmoor Social Research' }));
    api.on('POST', '/api/account/password', ({ body }) => {
      const { password } = body as { password: string };
      if (password.length < 12) {
        return json({ statusCode: 400, error: 'Bad Request', message: 'password must be at least 12 characters long', fields: [{ field: 'password', message: 'password must be at least 12 characters long' }] }, 400);
      }
      return json({ email: 'interviewer@vellmoor.example' });
    });
    api.on('POST', '/api/auth/login', () => json(authResponse('interviewer')));
    renderApp(`/set-password#token=${TOKEN}`);
    const user = userEvent.setup();

    expect(await screen.findByRole('heading', { level: 1, name: 'Choose your password' })).toBeInTheDocument();
    expect(await screen.findByText(/Welcome, Ivo Tarrant/)).toBeInTheDocument();
    // The token leaves the address bar once read.
    expect(window.location.hash).toBe('');
    expect(api.calls.find((c) => c.path === '/api/account/link')!.body).toEqual({ token: TOKEN });

    await user.type(screen.getByLabelText('New password'), 'too short');
    await user.click(screen.getByRole('button', { name: 'Save password and sign in' }));
    expect(await screen.findByText('password must be at least 12 characters long')).toBeInTheDocument();

    await user.clear(screen.getByLabelText('New password'));
    await user.type(screen.getByLabelText('New password'), 'tram lines over Harrowby');
    await user.click(screen.getByRole('button', { name: 'Save password and sign in' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Today' })).toBeInTheDocument();
    expect((await readSession())?.user.role).toBe('interviewer');
    expect(api.calls.find((c) => c.path === '/api/auth/login')!.body).toEqual({ email: 'interviewer@vellmoor.example', password: 'tram lines over Harrowby' });
  });

  it('says plainly when the link has expired and offers a new one', async () => {
    const api = installFakeApi();
    api.on('POST', '/api/account/link', () => problem(410, 'Gone', 'This link has expired; ask for a new one'));
    renderApp(`/set-password#token=${TOKEN}`);
    expect(await screen.findByRole('heading', { level: 1, name: 'This link cannot be used' })).toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent('This link has expired; ask for a new one');
    expect(screen.getByRole('link', { name: 'Ask for a new password link' })).toHaveAttribute('href', '/forgot-password');
  });
});

describe('signed-out links', () => {
  it('offers a forgotten-password form that answers the same for any address', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/sign-up', () => json({ enabled: false }));
    api.on('POST', '/api/account/password-reset', () => json({ message: 'If that address has an account, a link to choose a new password is on its way' }, 202));
    renderApp('/sign-in');
    expect(await screen.findByRole('link', { name: 'Forgot your password?' })).toHaveAttribute('href', '/forgot-password');
    expect(screen.queryByRole('link', { name: /Start an organisation/ })).toBeNull();

    renderApp('/forgot-password');
    const user = userEvent.setup();
    await screen.findAllByRole('heading', { level: 1, name: 'Forgot your password?' });
    await user.type(screen.getAllByLabelText('E-mail').at(-1)!, 'someone@vellmoor.example');
    await user.click(screen.getAllByRole('button', { name: 'Send me a link' }).at(-1)!);
    expect(await screen.findByText(/If that address has an account/)).toHaveAttribute('role', 'status');
  });

  it('offers sign-up only when the server has it switched on', async () => {
    const api = installFakeApi();
    api.on('GET', '/api/sign-up', () => json({ enabled: true }));
    api.on('POST', '/api/sign-up', () => json({ message: 'Check your e-mail: the link in it confirms your address and lets you choose a password' }, 202));
    renderApp('/sign-in');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('link', { name: 'New agency? Start an organisation' }));
    await user.type(await screen.findByLabelText('Organisation'), 'Harrowby Field Services');
    await user.type(screen.getByLabelText('Your name'), 'Rhea Castell');
    await user.type(screen.getByLabelText('Your e-mail'), 'rhea@harrowby.example');
    await user.click(screen.getByRole('button', { name: 'Create the organisation' }));
    expect(await screen.findByText(/Check your e-mail/)).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'POST' && c.path === '/api/sign-up')!.body).toEqual({
      organisation: 'Harrowby Field Services',
      name: 'Rhea Castell',
      email: 'rhea@harrowby.example',
    });
  });
});
