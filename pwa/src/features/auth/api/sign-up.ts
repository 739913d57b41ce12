// GET and POST /api/sign-up: whether new organisations may sign up here, and signing one up
// (its admin confirms the address through the e-mailed link). Signed out.
import { useMutation, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export interface SignUp {
  organisation: string;
  name: string;
  email: string;
}

export const signUpKeys = { settings: ['sign-up', 'settings'] as const };

export function getSignUpSettings(): Promise<{ enabled: boolean }> {
  return apiRequest<{ enabled: boolean }>('/sign-up', { auth: false });
}

export function useSignUpSettings() {
  return useQuery({ queryKey: signUpKeys.settings, queryFn: getSignUpSettings, staleTime: 5 * 60_000 });
}

export function signUp(body: SignUp): Promise<{ message: string }> {
  return apiRequest<{ message: string }>('/sign-up', { method: 'POST', body, auth: false });
}

export function useSignUp() {
  return useMutation({ mutationFn: signUp });
}
