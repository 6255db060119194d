import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { numberPhotos, type ChartPhoto } from '../chart/photo-marks';
import type { PhotoSummary } from '../data/photos';
import { fetchJson } from './fetch-json';

export const photoKeys = { project: (projectId: string) => ['projects', projectId, 'photos'] as const };

export const projectPhotosQuery = (projectId: string) =>
  queryOptions({
    queryKey: photoKeys.project(projectId),
    queryFn: async () => (await fetchJson<{ photos: PhotoSummary[] }>(`/api/projects/${projectId}/photos`)).photos,
  });

/** A photo numbered along its route (the number its marks and the report show), with its details. */
export type NumberedPhoto = ChartPhoto & { source: PhotoSummary };

/** The photos placed on one route, numbered along it, for the drawings. */
export function useRoutePhotos(projectId: string, routeId: string | null): NumberedPhoto[] {
  const { data } = useQuery({ ...projectPhotosQuery(projectId), enabled: routeId !== null });
  return useMemo(() => numberPhotos((data ?? []).filter((p) => p.routeId === routeId)), [data, routeId]);
}

export const photoImageUrl = (photoId: string, size: 'full' | 'thumbnail' = 'full') =>
  `/api/photos/${photoId}/image${size === 'thumbnail' ? '?size=thumbnail' : ''}`;

export interface PhotoUploadInput {
  file: File;
  routeId?: string;
  /** Metres; used for a photo that carries no position. */
  chainageM?: number;
}

export function useUploadPhoto(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async ({ file, routeId, chainageM }: PhotoUploadInput) => {
      const form = new FormData();
      form.append('file', file, file.name);
      if (routeId) form.append('routeId', routeId);
      if (chainageM !== undefined) form.append('chainageM', String(chainageM));
      return (await fetchJson<{ photo: PhotoSummary }>(`/api/projects/${projectId}/photos`, { method: 'POST', form }))
        .photo;
    },
    onSuccess: () => client.invalidateQueries({ queryKey: photoKeys.project(projectId) }),
  });
}

export function useUpdatePhoto(projectId: string) {
  const client = useQueryClient();
  const key = photoKeys.project(projectId);
  return useMutation({
    mutationFn: ({
      photoId,
      ...changes
    }: {
      photoId: string;
      caption?: string;
      inReport?: boolean;
      routeId?: string;
      chainageM?: number;
    }) => fetchJson<{ photo: PhotoSummary }>(`/api/photos/${photoId}`, { method: 'PATCH', body: changes }),
    // The report box and caption change at once on screen; the server's answer then replaces the list (or the old one
    // comes back on an error).
    onMutate: async ({ photoId, caption, inReport }) => {
      await client.cancelQueries({ queryKey: key });
      const before = client.getQueryData<PhotoSummary[]>(key);
      if (before) {
        client.setQueryData<PhotoSummary[]>(
          key,
          before.map((p) =>
            p.id === photoId
              ? { ...p, ...(caption !== undefined ? { caption } : {}), ...(inReport !== undefined ? { inReport } : {}) }
              : p,
          ),
        );
      }
      return { before };
    },
    onError: (_error, _changes, context) => {
      if (context?.before) client.setQueryData(key, context.before);
    },
    onSettled: () => client.invalidateQueries({ queryKey: key }),
  });
}

export function useDeletePhoto(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) => fetchJson<void>(`/api/photos/${photoId}`, { method: 'DELETE' }),
    onSettled: () => client.invalidateQueries({ queryKey: photoKeys.project(projectId) }),
  });
}
