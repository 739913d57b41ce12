// POST /api/auth/logout, then delete the device's session row. Only the session row:
// the outbox keeps every unsent interview for when the same interviewer signs in again.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { clearSession, readSession } from '../../../db/session-store';
import { authMutationKeys } from './sign-in';

export async function signOut(): Promise<void> {
  const session = await readSession();
  if (session) {
    try {
      await apiRequest<void>('/auth/logout', {
        method: 'POST',
        body: { refreshToken: session.refreshToken },
        auth: false,
      });
    } catch {
      // Offline or already ended: the device still forgets the sign-in, and the refresh
      // token dies on the server when it expires.
    }
  }
  await clearSession();
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: authMutationKeys.signOut,
    mutationFn: signOut,
    networkMode: 'always',
    // Server data belonged to the person who left; drop it from memory.
    onSuccess: () => queryClient.clear(),
  });
}
