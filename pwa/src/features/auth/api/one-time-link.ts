// POST /api/account/link and /api/account/password: what a one-time link (invitation or
// password reset) is for, and setting the password with it. Signed out; the token travels
// in the body, never in a URL.
import { useMutation, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export interface LinkDetails {
  purpose: 'invitation' | 'password_reset';
  email: string;
  name: string;
  organisation: string;
}

export const linkKeys = {
  details: (token: string) => ['account-link', token] as const,
};

export function getLinkDetails(token: string): Promise<LinkDetails> {
  return apiRequest<LinkDetails>('/account/link', { method: 'POST', body: { token }, auth: false });
}

export function useLinkDetails(token: string) {
  return useQuery({ queryKey: linkKeys.details(token), queryFn: () => getLinkDetails(token), enabled: token !== '', retry: false });
}

export function setPasswordWithLink(token: string, password: string): Promise<{ email: string }> {
  return apiRequest<{ email: string }>('/account/password', { method: 'POST', body: { token, password }, auth: false });
}

export function useSetPasswordWithLink() {
  return useMutation({ mutationFn: ({ token, password }: { token: string; password: string }) => setPasswordWithLink(token, password) });
}
