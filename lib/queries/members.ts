import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { MemberSummary } from '../data/teams';
import type { Role } from '../roles';
import { fetchJson } from './fetch-json';

export const memberKeys = { team: (teamId: string) => ['teams', teamId, 'members'] as const };

export const teamMembersQuery = (teamId: string) =>
  queryOptions({
    queryKey: memberKeys.team(teamId),
    queryFn: async () => (await fetchJson<{ members: MemberSummary[] }>(`/api/teams/${teamId}/members`)).members,
  });

export function useChangeRole(teamId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      fetchJson<{ member: MemberSummary }>(`/api/teams/${teamId}/members/${userId}`, {
        method: 'PATCH',
        body: { role },
      }),
    onSettled: () => client.invalidateQueries({ queryKey: memberKeys.team(teamId) }),
  });
}

export function useRemoveMember(teamId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => fetchJson<void>(`/api/teams/${teamId}/members/${userId}`, { method: 'DELETE' }),
    onSettled: () => client.invalidateQueries({ queryKey: memberKeys.team(teamId) }),
  });
}
