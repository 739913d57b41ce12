// POST /api/account/password-reset: signed out; the answer is the same whether or not the address has an account.
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function requestPasswordReset(email: string): Promise<{ message: string }> {
  return apiRequest<{ message: string }>('/account/password-reset', { method: 'POST', body: { email }, auth: false });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
