import { queryOptions, useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { LineRecord, LineSummary } from '../data/lines';
import type { LineSiteContext } from '../lines/ram-start';
import type { LineRouteStation } from '../lines/route-stations';
import type { CreateLineInput, DuplicateLineInput, UpdateLineInput } from '../validations/lines';
import { fetchJson } from './fetch-json';
import { networkKeys } from './network';

export const lineKeys = {
  project: (projectId: string) => ['projects', projectId, 'lines'] as const,
  one: (lineId: string) => ['lines', lineId] as const,
  stations: (lineId: string) => ['lines', lineId, 'stations'] as const,
  siteContext: (lineId: string) => ['lines', lineId, 'site-context'] as const,
};

export const projectLinesQuery = (projectId: string) =>
  queryOptions({
    queryKey: lineKeys.project(projectId),
    queryFn: async () => (await fetchJson<{ lines: LineSummary[] }>(`/api/projects/${projectId}/lines`)).lines,
  });

export const lineQuery = (lineId: string) =>
  queryOptions({
    queryKey: lineKeys.one(lineId),
    queryFn: async () => (await fetchJson<{ line: LineRecord }>(`/api/lines/${lineId}`)).line,
  });

export const lineStationsQuery = (lineId: string) =>
  queryOptions({
    queryKey: lineKeys.stations(lineId),
    queryFn: async () => (await fetchJson<{ stations: LineRouteStation[] }>(`/api/lines/${lineId}/stations`)).stations,
    // A route changes through the survey screens, not while a line is being edited.
    staleTime: 5 * 60_000,
  });

/**
 * Ram sites that can feed the line and the frost depth, read again when the window regains focus (the lift page may
 * have changed them).
 */
export const lineSiteContextQuery = (lineId: string) =>
  queryOptions({
    queryKey: lineKeys.siteContext(lineId),
    queryFn: () => fetchJson<LineSiteContext>(`/api/lines/${lineId}/site-context`),
  });

export function useCreateLine(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: CreateLineInput) =>
      (await fetchJson<{ line: LineRecord }>(`/api/projects/${projectId}/lines`, { method: 'POST', body: input })).line,
    onSuccess: () => client.invalidateQueries({ queryKey: lineKeys.project(projectId) }),
  });
}

/**
 * What a saved line makes stale: the project's line list, the line's site context (it carries the
 * network's flows along the line, which a new flow, start or stretch changes) and the network view.
 */
export function afterLineSaved(client: QueryClient, line: LineRecord): Promise<unknown> {
  client.setQueryData(lineKeys.one(line.id), line);
  return Promise.all([
    client.invalidateQueries({ queryKey: lineKeys.project(line.projectId) }),
    client.invalidateQueries({ queryKey: lineKeys.siteContext(line.id) }),
    client.invalidateQueries({ queryKey: networkKeys.view(line.projectId) }),
  ]);
}

export function useUpdateLine(lineId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: UpdateLineInput) =>
      (await fetchJson<{ line: LineRecord }>(`/api/lines/${lineId}`, { method: 'PATCH', body: input })).line,
    onSuccess: (line) => afterLineSaved(client, line),
  });
}

/** Deletes a line of the project; the line to delete is given at the call, so one hook serves a whole list. */
export function useDeleteLine(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (lineId: string) => fetchJson<void>(`/api/lines/${lineId}`, { method: 'DELETE' }),
    onSuccess: (_, lineId) => {
      client.removeQueries({ queryKey: lineKeys.one(lineId) });
      return client.invalidateQueries({ queryKey: lineKeys.project(projectId) });
    },
  });
}

/** Copies a line on the same route ("… (copy)"); answers the new line. */
export function useDuplicateLine(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async ({ lineId, ...input }: DuplicateLineInput & { lineId: string }) =>
      (await fetchJson<{ line: LineRecord }>(`/api/lines/${lineId}/duplicate`, { method: 'POST', body: input })).line,
    onSuccess: (line) => {
      client.setQueryData(lineKeys.one(line.id), line);
      return client.invalidateQueries({ queryKey: lineKeys.project(projectId) });
    },
  });
}
