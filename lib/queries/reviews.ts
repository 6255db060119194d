import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { CommentRecord } from '../review/comment-types';
import type { RevisionSummary } from '../review/revision-types';
import type { RevisionAction } from '../review/transitions';
import type { CreateCommentInput } from '../validations/comments';
import type { CreateRevisionInput } from '../validations/revisions';
import { fetchJson } from './fetch-json';

export const reviewKeys = {
  revisions: (projectId: string) => ['projects', projectId, 'revisions'] as const,
  comments: (projectId: string) => ['projects', projectId, 'comments'] as const,
};

export const projectRevisionsQuery = (projectId: string) =>
  queryOptions({
    queryKey: reviewKeys.revisions(projectId),
    queryFn: async () =>
      (await fetchJson<{ revisions: RevisionSummary[] }>(`/api/projects/${projectId}/revisions`)).revisions,
  });

export const projectCommentsQuery = (projectId: string) =>
  queryOptions({
    queryKey: reviewKeys.comments(projectId),
    queryFn: async () =>
      (await fetchJson<{ comments: CommentRecord[] }>(`/api/projects/${projectId}/comments`)).comments,
  });

export function useCreateRevision(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: CreateRevisionInput) =>
      (
        await fetchJson<{ revision: RevisionSummary }>(`/api/projects/${projectId}/revisions`, {
          method: 'POST',
          body: input,
        })
      ).revision,
    onSuccess: () => client.invalidateQueries({ queryKey: reviewKeys.revisions(projectId) }),
  });
}

export function useRevisionAction(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async ({ revisionId, action, note }: { revisionId: string; action: RevisionAction; note?: string }) =>
      (
        await fetchJson<{ revision: RevisionSummary }>(`/api/revisions/${revisionId}/${action}`, {
          method: 'POST',
          body: { note: note ?? '' },
        })
      ).revision,
    onSettled: () => client.invalidateQueries({ queryKey: reviewKeys.revisions(projectId) }),
  });
}

export function useCreateComment(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: CreateCommentInput) =>
      (
        await fetchJson<{ comment: { id: string } }>(`/api/projects/${projectId}/comments`, {
          method: 'POST',
          body: input,
        })
      ).comment,
    onSuccess: () => client.invalidateQueries({ queryKey: reviewKeys.comments(projectId) }),
  });
}

export function useResolveComment(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async ({ commentId, resolved }: { commentId: string; resolved: boolean }) =>
      (
        await fetchJson<{ comment: { id: string; resolved: boolean } }>(`/api/comments/${commentId}`, {
          method: 'PATCH',
          body: { resolved },
        })
      ).comment,
    onSuccess: () => client.invalidateQueries({ queryKey: reviewKeys.comments(projectId) }),
  });
}
