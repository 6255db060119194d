import { useMutation } from '@tanstack/react-query';
import type { TeamSummary } from '../data/teams';
import { fetchJson } from './fetch-json';

export function useCreateTeam() {
  return useMutation({
    mutationFn: async (name: string) =>
      (await fetchJson<{ team: TeamSummary }>('/api/teams', { method: 'POST', body: { name } })).team,
  });
}

export function useRenameTeam(teamId: string) {
  return useMutation({
    mutationFn: async (name: string) =>
      (
        await fetchJson<{ team: { id: string; name: string } }>(`/api/teams/${teamId}`, {
          method: 'PATCH',
          body: { name },
        })
      ).team,
  });
}
