import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProjectSummary } from '../data/projects';
import type { CreateProjectInput, UpdateProjectInput } from '../validations/projects';
import { fetchJson } from './fetch-json';

export const projectKeys = {
  team: (teamId: string) => ['teams', teamId, 'projects'] as const,
  one: (projectId: string) => ['projects', projectId] as const,
};

export const teamProjectsQuery = (teamId: string) =>
  queryOptions({
    queryKey: projectKeys.team(teamId),
    queryFn: async () => (await fetchJson<{ projects: ProjectSummary[] }>(`/api/teams/${teamId}/projects`)).projects,
  });

export const projectQuery = (projectId: string) =>
  queryOptions({
    queryKey: projectKeys.one(projectId),
    queryFn: async () => (await fetchJson<{ project: ProjectSummary }>(`/api/projects/${projectId}`)).project,
  });

export function useCreateProject(teamId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: CreateProjectInput) =>
      (await fetchJson<{ project: ProjectSummary }>(`/api/teams/${teamId}/projects`, { method: 'POST', body: input }))
        .project,
    onSuccess: () => client.invalidateQueries({ queryKey: projectKeys.team(teamId) }),
  });
}

export function useUpdateProject(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: UpdateProjectInput) =>
      (await fetchJson<{ project: ProjectSummary }>(`/api/projects/${projectId}`, { method: 'PATCH', body: input }))
        .project,
    onSuccess: (project) => {
      client.setQueryData(projectKeys.one(projectId), project);
      return client.invalidateQueries({ queryKey: projectKeys.team(project.teamId) });
    },
  });
}

export function useDeleteProject(projectId: string, teamId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => fetchJson<void>(`/api/projects/${projectId}`, { method: 'DELETE' }),
    onSuccess: () => client.invalidateQueries({ queryKey: projectKeys.team(teamId) }),
  });
}
