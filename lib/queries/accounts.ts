import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { NotificationPreferences } from '../notifications/kinds';
import type { PasswordChangeInput, SignUpInput } from '../validations/auth';
import { fetchJson } from './fetch-json';

type CheckYourMail = { status: 'check-your-mail'; email: string };

export function useSignUp() {
  return useMutation({
    mutationFn: (input: SignUpInput) => fetchJson<CheckYourMail>('/api/accounts', { method: 'POST', body: input }),
  });
}

export function useConfirmSignUp() {
  return useMutation({
    mutationFn: (token: string) =>
      fetchJson<{ confirmed: { email: string } }>('/api/accounts/confirm', { method: 'POST', body: { token } }),
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (email: string) =>
      fetchJson<CheckYourMail>('/api/accounts/password-reset', { method: 'POST', body: { email } }),
  });
}

export function useResetPassword() {
  return useMutation({
    mutationFn: (input: { token: string; password: string }) =>
      fetchJson<{ reset: { email: string } }>('/api/accounts/password-reset/confirm', { method: 'POST', body: input }),
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: (input: PasswordChangeInput) =>
      fetchJson<{ changed: true }>('/api/accounts/password', { method: 'PUT', body: input }),
  });
}

export function useSignOutEverywhere() {
  return useMutation({
    mutationFn: () => fetchJson<{ signedOut: true }>('/api/accounts/sign-out-everywhere', { method: 'POST' }),
  });
}

export const notificationKeys = { mine: ['accounts', 'me', 'notifications'] as const };

export const notificationPreferencesQuery = () =>
  queryOptions({
    queryKey: notificationKeys.mine,
    queryFn: async () =>
      (await fetchJson<{ preferences: NotificationPreferences }>('/api/accounts/notifications')).preferences,
  });

export function useSetNotificationPreferences() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (changes: Partial<NotificationPreferences>) =>
      (
        await fetchJson<{ preferences: NotificationPreferences }>('/api/accounts/notifications', {
          method: 'PUT',
          body: changes,
        })
      ).preferences,
    onSuccess: (prefs) => client.setQueryData(notificationKeys.mine, prefs),
  });
}
