import { useMutation } from '@tanstack/react-query';
import type { SignUpInput } from '../validations/auth';
import { fetchJson } from './fetch-json';

export function useSignUp() {
  return useMutation({
    mutationFn: (input: SignUpInput) => fetchJson<{ user: { id: string; email: string } }>('/api/accounts', { method: 'POST', body: input }),
  });
}

export function useSignOutEverywhere() {
  return useMutation({
    mutationFn: () => fetchJson<{ signedOut: true }>('/api/accounts/sign-out-everywhere', { method: 'POST' }),
  });
}
