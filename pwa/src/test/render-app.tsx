import { render } from '@testing-library/react';
import { App } from '../app/app';
import { createQueryClient } from '../app/query-client';
import { saveSession } from '../db/session-store';
import type { Role } from '../config/roles';
import { authResponse } from './fake-api';

/** Renders the whole app at `path` with a fresh query client (no retries, so errors show at once). */
export function renderApp(path = '/') {
  window.history.replaceState(null, '', path);
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { retry: false, staleTime: Infinity } });
  return { queryClient, ...render(<App queryClient={queryClient} />) };
}

/** Puts a signed-in session on the device, as a previous visit would have left it. */
export async function signedInAs(role: Role) {
  return saveSession(authResponse(role));
}
