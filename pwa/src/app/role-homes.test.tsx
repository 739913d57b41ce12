import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Role } from '../config/roles';
import { installFakeApi, json } from '../test/fake-api';
import { renderApp, signedInAs } from '../test/render-app';

const homes: { role: Role; path: string; title: string; sections: string[] }[] = [
  { role: 'interviewer', path: '/interviewer', title: 'Today', sections: ['Today', 'Outbox', 'Cells'] },
  { role: 'supervisor', path: '/supervisor', title: 'Quota board', sections: ['Quota board', 'Review queue', 'Interviewers', 'Back-checks'] },
  { role: 'lead', path: '/lead', title: 'Projects', sections: ['Projects', 'Balance', 'Benchmarks', 'Delivery'] },
  { role: 'client', path: '/client', title: 'Progress', sections: ['Progress', 'Projection', 'Other polls'] },
  { role: 'admin', path: '/admin', title: 'People', sections: [] },
];

describe('role homes', () => {
  it.each(homes)('a signed-in $role opening the app lands on "$title" at $path', async ({ role, path, title, sections }) => {
    const api = installFakeApi();
    api.on('GET', '/api/projects', () => json([]));
    api.on('GET', '/api/users', () => json([]));
    await signedInAs(role);
    renderApp('/');

    expect(await screen.findByRole('heading', { level: 1, name: title })).toBeInTheDocument();
    expect(window.location.pathname).toBe(path);
    if (sections.length > 0) {
      const nav = screen.getByRole('navigation', { name: 'Sections' });
      expect(within(nav).getAllByRole('link').map((link) => link.textContent)).toEqual(sections);
    }
  });

  it("sends a role visiting another role's area back to its own home", async () => {
    installFakeApi();
    await signedInAs('interviewer');
    renderApp('/lead/balance');

    expect(await screen.findByRole('heading', { level: 1, name: 'Today' })).toBeInTheDocument();
    expect(window.location.pathname).toBe('/interviewer');
  });

  it('sends a signed-in person away from the sign-in page to their home', async () => {
    installFakeApi();
    await signedInAs('supervisor');
    renderApp('/sign-in');

    expect(await screen.findByRole('heading', { level: 1, name: 'Quota board' })).toBeInTheDocument();
  });

  it('moves between sections with the navigation', async () => {
    installFakeApi();
    await signedInAs('interviewer');
    renderApp('/interviewer');
    await screen.findByRole('heading', { level: 1, name: 'Today' });

    screen.getByRole('link', { name: 'Outbox' }).click();

    expect(await screen.findByRole('heading', { level: 1, name: 'Outbox' })).toBeInTheDocument();
    expect(window.location.pathname).toBe('/interviewer/outbox');
  });
});
