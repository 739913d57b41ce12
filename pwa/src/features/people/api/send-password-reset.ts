// POST /api/users/:id/password-reset (admin): mails the person a one-time link to choose a new password.
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function sendPasswordReset(id: string): Promise<{ message: string }> {
  return apiRequest<{ message: string }>(`/users/${id}/password-reset`, { method: 'POST' });
}

export function useSendPasswordReset() {
  return useMutation({ mutationFn: sendPasswordReset });
}
