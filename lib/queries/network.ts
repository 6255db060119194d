import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ProjectTankStorage } from '../data/network-tank-storage';
import type { NetworkJobView } from '../network/jobs';
import type { NetworkView } from '../network/view';
import type { NetworkLinkInput, NetworkNodeInput, NetworkRunInput } from '../validations/network';
import { fetchJson } from './fetch-json';

export const networkKeys = {
  view: (projectId: string) => ['projects', projectId, 'network'] as const,
  run: (projectId: string, runId: string) => ['projects', projectId, 'network', 'runs', runId] as const,
};

export const networkQuery = (projectId: string) =>
  queryOptions({
    queryKey: networkKeys.view(projectId),
    queryFn: async () => (await fetchJson<{ network: NetworkView }>(`/api/projects/${projectId}/network`)).network,
  });

/** Every network write changes the page's data, so each refetches the view. */
function useNetworkWrite<V>(
  projectId: string,
  request: (variables: V) => { url: string; method: string; body?: unknown },
) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (variables: V) => {
      const { url, method, body } = request(variables);
      return fetchJson<unknown>(`/api/projects/${projectId}${url}`, { method, body });
    },
    onSuccess: () => client.invalidateQueries({ queryKey: networkKeys.view(projectId) }),
  });
}

type Save<T> = { id: string | null; input: T };

export const useSaveNetworkNode = (projectId: string) =>
  useNetworkWrite(projectId, ({ id, input }: Save<NetworkNodeInput>) =>
    id
      ? { url: `/network/nodes/${id}`, method: 'PUT', body: input }
      : { url: '/network/nodes', method: 'POST', body: input },
  );
export const useDeleteNetworkNode = (projectId: string) =>
  useNetworkWrite(projectId, (id: string) => ({ url: `/network/nodes/${id}`, method: 'DELETE' }));
export const useSaveNetworkLink = (projectId: string) =>
  useNetworkWrite(projectId, ({ id, input }: Save<NetworkLinkInput>) =>
    id
      ? { url: `/network/links/${id}`, method: 'PUT', body: input }
      : { url: '/network/links', method: 'POST', body: input },
  );
export const useDeleteNetworkLink = (projectId: string) =>
  useNetworkWrite(projectId, (id: string) => ({ url: `/network/links/${id}`, method: 'DELETE' }));
export const usePlaceTakeOff = (projectId: string) =>
  useNetworkWrite(projectId, (input: { lineId: string; chainageM: number; name: string }) => ({
    url: '/network/take-offs',
    method: 'POST',
    body: input,
  }));
export const useTieDemandUse = (projectId: string) =>
  useNetworkWrite(projectId, ({ useId, outletNodeId }: { useId: string; outletNodeId: string | null }) => ({
    url: `/demand-uses/${useId}/outlet`,
    method: 'PUT',
    body: { outletNodeId },
  }));

/** Writes the pipes a finished sizing run chose to the network's pipes and lines (the line pages then show them). */
export function useApplySizes(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (jobId: string) =>
      (
        await fetchJson<{ applied: { pipes: number; lines: number } }>(
          `/api/projects/${projectId}/network/runs/${jobId}/apply`,
          { method: 'POST' },
        )
      ).applied,
    onSuccess: async () => {
      await client.invalidateQueries({ queryKey: networkKeys.view(projectId) });
      await client.invalidateQueries({ queryKey: ['lines'] });
    },
  });
}

/** Each tank's storage from the outlets it serves in the network, for the Lift & storage page. */
export const tankStorageQuery = (projectId: string) =>
  queryOptions({
    queryKey: ['projects', projectId, 'network', 'tank-storage'] as const,
    queryFn: async () =>
      (await fetchJson<{ storage: ProjectTankStorage }>(`/api/projects/${projectId}/network/tank-storage`)).storage,
  });

/** Starts a run; the page then polls it until it is done. */
export function useStartNetworkRun(projectId: string) {
  return useMutation({
    mutationFn: async (input: Partial<NetworkRunInput> & { kind: NetworkRunInput['kind'] }) =>
      (
        await fetchJson<{ run: NetworkJobView }>(`/api/projects/${projectId}/network/runs`, {
          method: 'POST',
          body: input,
        })
      ).run,
  });
}

/** Polls a run every half second while it works; refetches the page's view when it ends. */
export function useNetworkRun(projectId: string, runId: string | null) {
  const client = useQueryClient();
  return useQuery({
    queryKey: networkKeys.run(projectId, runId ?? 'none'),
    enabled: runId !== null,
    queryFn: async () => {
      const run = (await fetchJson<{ run: NetworkJobView }>(`/api/projects/${projectId}/network/runs/${runId}`)).run;
      if (run.status === 'done' || run.status === 'failed')
        await client.invalidateQueries({ queryKey: networkKeys.view(projectId), exact: true });
      return run;
    },
    refetchInterval: (query) =>
      query.state.data && (query.state.data.status === 'done' || query.state.data.status === 'failed') ? false : 500,
  });
}
