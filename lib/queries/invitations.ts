import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvitationSummary } from '../data/invitations';
import type { Role } from '../roles';
import type { AcceptInvitationInput } from '../validations/auth';
import type { InviteMemberInput } from '../validations/teams';
import { fetchJson } from './fetch-json';

export const invitationKeys = { team: (teamId: string) => ['teams', teamId, 'invitations'] as const };

export const teamInvitationsQuery = (teamId: string) =>
  queryOptions({
    queryKey: invitationKeys.team(teamId),
    queryFn: async () =>
      (await fetchJson<{ invitations: InvitationSummary[] }>(`/api/teams/${teamId}/invitations`)).invitations,
  });

export function useInvite(teamId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteMemberInput) =>
      fetchJson<{ invitation: InvitationSummary }>(`/api/teams/${teamId}/invitations`, { method: 'POST', body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: invitationKeys.team(teamId) }),
  });
}

export function useRevokeInvitation(teamId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) =>
      fetchJson<void>(`/api/teams/${teamId}/invitations/${invitationId}`, { method: 'DELETE' }),
    onSettled: () => client.invalidateQueries({ queryKey: invitationKeys.team(teamId) }),
  });
}

export function useAcceptInvitation() {
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) =>
      fetchJson<{ joined: { teamId: string; role: Role; email: string } }>('/api/invitations/accept', {
        method: 'POST',
        body: input,
      }),
  });
}
