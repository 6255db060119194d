import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApiErrorBody } from '../errors';
import type { RoutePointsPage, RouteProposalsAnswer, RouteSummary, RouteView } from '../routes/types';
import type { SurveyImportWarning } from '../survey/parsed-survey';
import { ROUTE_PAGE_SIZE } from '../validations/routes';
import type {
  CleanupDecisionInput,
  CreateRouteInput,
  JoinRoutesInput,
  SavePointsInput,
  SplitRouteInput,
  TrimRouteInput,
  UpdateRouteInput,
} from '../validations/routes';
import type { SurveyImportOptions } from '../validations/survey-import';
import { ApiError, fetchJson } from './fetch-json';

export const routeKeys = {
  project: (projectId: string) => ['projects', projectId, 'routes'] as const,
  /** Everything read about one route (its view and its pages of rows). */
  one: (routeId: string) => ['routes', routeId] as const,
  view: (routeId: string) => ['routes', routeId, 'view'] as const,
  pages: (routeId: string) => ['routes', routeId, 'points'] as const,
  page: (routeId: string, offset: number, limit: number) => ['routes', routeId, 'points', offset, limit] as const,
};

export { ROUTE_PAGE_SIZE };

export const projectRoutesQuery = (projectId: string) =>
  queryOptions({
    queryKey: routeKeys.project(projectId),
    queryFn: async () => (await fetchJson<{ routes: RouteSummary[] }>(`/api/projects/${projectId}/routes`)).routes,
  });

/** The route page's header, thinned profile, plan and proposals (never the points). */
export const routeViewQuery = (routeId: string) =>
  queryOptions({
    queryKey: routeKeys.view(routeId),
    queryFn: () => fetchJson<RouteView>(`/api/routes/${routeId}/view`),
  });

/** One page of the route's rows, from `offset` (a seq). */
export const routePointsQuery = (routeId: string, offset: number, limit = ROUTE_PAGE_SIZE) =>
  queryOptions({
    queryKey: routeKeys.page(routeId, offset, limit),
    queryFn: () => fetchJson<RoutePointsPage>(`/api/routes/${routeId}/points?offset=${offset}&limit=${limit}`),
  });

/** Smoothing or a benchmark offset proposed by the server over the stored route. */
export function useProposeCleanup(routeId: string) {
  return useMutation({
    mutationFn: (ask: { smoothingWindow: number } | { benchmarkPoint: number; benchmarkElevationM: number }) =>
      fetchJson<RouteProposalsAnswer>(
        `/api/routes/${routeId}/proposals?${new URLSearchParams(Object.entries(ask).map(([k, v]) => [k, String(v)]))}`,
      ),
  });
}

/** Where the original file of a route is downloaded from (a plain link, not a query). */
export const routeSourceUrl = (routeId: string) => `/api/routes/${routeId}/source`;

function useRouteMutation<I, O>(projectId: string, run: (input: I) => Promise<O>, onView?: (o: O) => RouteView | null) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: async (result) => {
      const view = onView?.(result);
      if (view) {
        // The write answers with the new view; the rows are read again, a page at a time.
        client.setQueryData(routeKeys.view(view.route.id), view);
        await client.invalidateQueries({ queryKey: routeKeys.pages(view.route.id) });
      }
      await client.invalidateQueries({ queryKey: routeKeys.project(projectId) });
    },
  });
}

export function useCreateRoute(projectId: string) {
  return useRouteMutation(
    projectId,
    async (input: CreateRouteInput) =>
      (await fetchJson<{ route: RouteSummary }>(`/api/projects/${projectId}/routes`, { method: 'POST', body: input }))
        .route,
  );
}

export function useUpdateRoute(projectId: string, routeId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: UpdateRouteInput) =>
      (await fetchJson<{ route: RouteSummary }>(`/api/routes/${routeId}`, { method: 'PATCH', body: input })).route,
    onSuccess: async () => {
      await client.invalidateQueries({ queryKey: routeKeys.one(routeId) });
      await client.invalidateQueries({ queryKey: routeKeys.project(projectId) });
    },
  });
}

export function useDeleteRoute(projectId: string, routeId: string) {
  return useRouteMutation(projectId, () => fetchJson<void>(`/api/routes/${routeId}`, { method: 'DELETE' }));
}

const viewOf = (v: RouteView) => v;

export function useSavePoints(projectId: string, routeId: string) {
  return useRouteMutation(
    projectId,
    (input: SavePointsInput) => fetchJson<RouteView>(`/api/routes/${routeId}/points`, { method: 'PUT', body: input }),
    viewOf,
  );
}

export function useCleanupDecision(projectId: string, routeId: string) {
  return useRouteMutation(
    projectId,
    (input: CleanupDecisionInput) =>
      fetchJson<RouteView>(`/api/routes/${routeId}/cleanup`, { method: 'POST', body: input }),
    viewOf,
  );
}

export function useReverseRoute(projectId: string, routeId: string) {
  return useRouteMutation(
    projectId,
    () => fetchJson<RouteView>(`/api/routes/${routeId}/reverse`, { method: 'POST' }),
    viewOf,
  );
}

export function useTrimRoute(projectId: string, routeId: string) {
  return useRouteMutation(
    projectId,
    (input: TrimRouteInput) => fetchJson<RouteView>(`/api/routes/${routeId}/trim`, { method: 'POST', body: input }),
    viewOf,
  );
}

export function useSplitRoute(projectId: string, routeId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SplitRouteInput) =>
      fetchJson<{ first: RouteSummary; second: RouteSummary }>(`/api/routes/${routeId}/split`, {
        method: 'POST',
        body: input,
      }),
    onSuccess: async () => {
      await client.invalidateQueries({ queryKey: routeKeys.one(routeId) });
      await client.invalidateQueries({ queryKey: routeKeys.project(projectId) });
    },
  });
}

export function useJoinRoutes(projectId: string, routeId: string) {
  return useRouteMutation(
    projectId,
    async (input: JoinRoutesInput) =>
      (await fetchJson<{ route: RouteSummary }>(`/api/routes/${routeId}/join`, { method: 'POST', body: input })).route,
  );
}

export interface ImportResult {
  route: RouteSummary;
  warnings: SurveyImportWarning[];
}

/**
 * Uploads a survey file with the chosen options. XMLHttpRequest rather than fetch because only it
 * reports upload progress, which a 50 MB file over a slow link needs.
 */
function uploadSurvey(
  projectId: string,
  file: File,
  options: SurveyImportOptions,
  onProgress: (fraction: number) => void,
): Promise<ImportResult> {
  const form = new FormData();
  form.append('file', file, file.name);
  form.append('options', JSON.stringify(options));
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/projects/${projectId}/routes/import`);
    xhr.withCredentials = true;
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    xhr.onerror = () =>
      reject(new ApiError(0, 'network', 'The upload did not reach the server; check the connection and try again'));
    xhr.onload = () => {
      let data: unknown = null;
      try {
        data = JSON.parse(xhr.responseText);
      } catch {
        data = null;
      }
      if (xhr.status >= 200 && xhr.status < 300) return resolve(data as ImportResult);
      const err = (data as ApiErrorBody | null)?.error;
      reject(
        new ApiError(xhr.status, err?.code ?? 'internal', err?.message ?? `Upload failed (${xhr.status})`, err?.fields),
      );
    };
    xhr.send(form);
  });
}

export function useImportSurvey(projectId: string) {
  return useRouteMutation(
    projectId,
    (input: { file: File; options: SurveyImportOptions; onProgress: (fraction: number) => void }) =>
      uploadSurvey(projectId, input.file, input.options, input.onProgress),
  );
}
