import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { LiftSummary } from '../lift/summary';
import type { DemandUseInput } from '../validations/demand-uses';
import type { CommissioningReadingInput, RamSiteInput } from '../validations/ram-sites';
import type {
  GenerateSeasonalTasksInput,
  SeasonalTaskInput,
  UpdateSeasonalTaskInput,
} from '../validations/seasonal-tasks';
import type { TankInput } from '../validations/tanks';
import type { WaterSourceInput, YieldReadingInput } from '../validations/water-sources';
import { fetchJson } from './fetch-json';

export const liftKeys = {
  summary: (projectId: string) => ['projects', projectId, 'lift'] as const,
};

export const liftSummaryQuery = (projectId: string) =>
  queryOptions({
    queryKey: liftKeys.summary(projectId),
    queryFn: async () => (await fetchJson<{ lift: LiftSummary }>(`/api/projects/${projectId}/lift`)).lift,
  });

/** Every lift write changes computed figures elsewhere on the page, so each one refetches the summary. */
function useLiftWrite<V>(
  projectId: string,
  request: (variables: V) => { url: string; method: string; body?: unknown },
) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (variables: V) => {
      const { url, method, body } = request(variables);
      return fetchJson<unknown>(`/api/projects/${projectId}${url}`, { method, body });
    },
    onSuccess: () => client.invalidateQueries({ queryKey: liftKeys.summary(projectId) }),
  });
}

type Save<T> = { id: string | null; input: T };
const saveTo =
  <T>(collection: string) =>
  ({ id, input }: Save<T>) =>
    id
      ? { url: `/${collection}/${id}`, method: 'PUT', body: input }
      : { url: `/${collection}`, method: 'POST', body: input };
const removeFrom = (collection: string) => (id: string) => ({ url: `/${collection}/${id}`, method: 'DELETE' });

export const useSaveRamSite = (projectId: string) => useLiftWrite(projectId, saveTo<RamSiteInput>('ram-sites'));
export const useDeleteRamSite = (projectId: string) => useLiftWrite(projectId, removeFrom('ram-sites'));
export const useAddCommissioningReading = (projectId: string, siteId: string) =>
  useLiftWrite(projectId, (input: CommissioningReadingInput) => ({
    url: `/ram-sites/${siteId}/commissioning`,
    method: 'POST',
    body: input,
  }));
export const useDeleteCommissioningReading = (projectId: string, siteId: string) =>
  useLiftWrite(projectId, removeFrom(`ram-sites/${siteId}/commissioning`));

export const useSaveSource = (projectId: string) => useLiftWrite(projectId, saveTo<WaterSourceInput>('sources'));
export const useDeleteSource = (projectId: string) => useLiftWrite(projectId, removeFrom('sources'));
export const useAddYieldReading = (projectId: string, sourceId: string) =>
  useLiftWrite(projectId, (input: YieldReadingInput) => ({
    url: `/sources/${sourceId}/yield-readings`,
    method: 'POST',
    body: input,
  }));
export const useDeleteYieldReading = (projectId: string, sourceId: string) =>
  useLiftWrite(projectId, removeFrom(`sources/${sourceId}/yield-readings`));

export const useSaveTank = (projectId: string) => useLiftWrite(projectId, saveTo<TankInput>('tanks'));
export const useDeleteTank = (projectId: string) => useLiftWrite(projectId, removeFrom('tanks'));

export const useSaveDemandUse = (projectId: string) => useLiftWrite(projectId, saveTo<DemandUseInput>('demand-uses'));
export const useDeleteDemandUse = (projectId: string) => useLiftWrite(projectId, removeFrom('demand-uses'));

export const useAddSeasonalTask = (projectId: string) =>
  useLiftWrite(projectId, (input: SeasonalTaskInput) => ({ url: '/seasonal-tasks', method: 'POST', body: input }));
export const useUpdateSeasonalTask = (projectId: string) =>
  useLiftWrite(projectId, ({ id, input }: { id: string; input: UpdateSeasonalTaskInput }) => ({
    url: `/seasonal-tasks/${id}`,
    method: 'PATCH',
    body: input,
  }));
export const useDeleteSeasonalTask = (projectId: string) => useLiftWrite(projectId, removeFrom('seasonal-tasks'));
export const useGenerateSeasonalTasks = (projectId: string) =>
  useLiftWrite(projectId, (input: GenerateSeasonalTasksInput) => ({
    url: '/seasonal-tasks/generate',
    method: 'POST',
    body: input,
  }));
