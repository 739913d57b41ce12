// POST /api/users/:id/invitation (admin): a fresh invitation link; the older one stops working.
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function resendInvitation(id: string): Promise<{ message: string }> {
  return apiRequest<{ message: string }>(`/users/${id}/invitation`, { method: 'POST' });
}

export function useResendInvitation() {
  return useMutation({ mutationFn: resendInvitation });
}
