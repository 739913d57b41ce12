// POST /api/auth/login. On success the tokens and user are written to the device session
// (Dexie), which is what flips the app from the sign-in page to the role's home.
import { useMutation } from '@tanstack/react-query';
import { apiRequest, type AuthResponse } from '../../../lib/api-client';
import type { LoginDto } from '../../../lib/api-types';
import { saveSession } from '../../../db/session-store';

export type Credentials = LoginDto;

export async function signIn(credentials: Credentials): Promise<AuthResponse> {
  const response = await apiRequest<AuthResponse>('/auth/login', {
    method: 'POST',
    body: credentials,
    auth: false,
  });
  await saveSession(response);
  return response;
}

export const authMutationKeys = {
  signIn: ['auth', 'sign-in'] as const,
  signOut: ['auth', 'sign-out'] as const,
};

export function useSignIn() {
  return useMutation({
    mutationKey: authMutationKeys.signIn,
    mutationFn: signIn,
    // Run even when the browser says offline, so the person gets the offline message at once.
    networkMode: 'always',
  });
}
