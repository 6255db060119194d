import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import { NewRevisionForm } from '@/components/reviews/new-revision-form';
import { RevisionsList } from '@/components/reviews/revisions-list';
import { WorkingCopyComments } from '@/components/reviews/working-copy-comments';
import { Panel } from '@/components/ui/panel';
import { requireProjectPage } from '@/lib/auth/project-page';
import { listComments } from '@/lib/data/comments';
import { listRevisions } from '@/lib/data/revisions';
import { can } from '@/lib/permissions';
import { reviewKeys } from '@/lib/queries/reviews';
import { getQueryClient } from '@/lib/queries/query-client';
import { RevisionsListSkeleton } from '@/components/reviews/revisions-list';
import { CommentsSkeleton } from '@/components/reviews/working-copy-comments';

export const metadata: Metadata = { title: 'Reviews' };

export default async function ReviewsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { project, role } = await requireProjectPage(params);
  const queryClient = getQueryClient();
  const client = !can(role, 'design.view');
  await Promise.all([
    queryClient.prefetchQuery({
      queryKey: reviewKeys.revisions(project.id),
      queryFn: () => listRevisions(project.id, role),
    }),
    client
      ? null
      : queryClient.prefetchQuery({
          queryKey: reviewKeys.comments(project.id),
          queryFn: () => listComments(project.id, role),
        }),
  ]);

  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-creek-900">Reviews</h1>
        <p className="text-sm text-creek-700">
          {client
            ? 'The revisions of this design that have been approved by a reviewer. Build only from an approved or issued revision.'
            : 'Numbered revisions of the whole design: a designer makes and submits one, a reviewer comments on its profiles and approves it or sends it back. Nobody approves their own revision.'}
        </p>
      </div>
      {can(role, 'design.edit') && (
        <Panel title="Make a revision of the working copy">
          <NewRevisionForm projectId={project.id} />
        </Panel>
      )}
      <HydrationBoundary state={dehydrate(queryClient)}>
        <Suspense fallback={<RevisionsListSkeleton />}>
          <RevisionsList projectId={project.id} />
        </Suspense>
        {!client && (
          <Panel title="Comments on the working copy">
            <Suspense fallback={<CommentsSkeleton />}>
              <WorkingCopyComments projectId={project.id} />
            </Suspense>
          </Panel>
        )}
      </HydrationBoundary>
    </div>
  );
}
