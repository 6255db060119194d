import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { PriceListItemRecord } from '../data/price-list';
import type { PriceListInput } from '../validations/network';
import { fetchJson } from './fetch-json';

export const priceListKeys = { team: (teamId: string) => ['teams', teamId, 'price-list'] as const };

export const priceListQuery = (teamId: string) =>
  queryOptions({
    queryKey: priceListKeys.team(teamId),
    queryFn: async () => (await fetchJson<{ items: PriceListItemRecord[] }>(`/api/teams/${teamId}/price-list`)).items,
  });

/** Saves the whole list (the API replaces it at once, so a pipe priced twice is caught with the rest). */
export function useSavePriceList(teamId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: PriceListInput) =>
      (
        await fetchJson<{ items: PriceListItemRecord[] }>(`/api/teams/${teamId}/price-list`, {
          method: 'PUT',
          body: input,
        })
      ).items,
    onSuccess: (items) => client.setQueryData(priceListKeys.team(teamId), items),
  });
}
