import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import { NetworkWorkspace } from '@/components/network/network-workspace';
import { RoleBadge } from '@/components/ui/role-badge';
import { requireProjectPage } from '@/lib/auth/project-page';
import { listComments, mentionableMembers } from '@/lib/data/comments';
import { networkView } from '@/lib/data/network-view';
import { can } from '@/lib/permissions';
import { networkKeys } from '@/lib/queries/network';
import { getQueryClient } from '@/lib/queries/query-client';
import { reviewKeys } from '@/lib/queries/reviews';
import { NetworkWorkspaceSkeleton } from '@/components/network/network-workspace-skeleton';

export const metadata: Metadata = { title: 'Network' };

export default async function NetworkPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { project, role, user } = await requireProjectPage(params, 'design.view');
  const queryClient = getQueryClient();
  await Promise.all([
    queryClient.prefetchQuery({ queryKey: networkKeys.view(project.id), queryFn: () => networkView(project.id) }),
    queryClient.prefetchQuery({
      queryKey: reviewKeys.comments(project.id),
      queryFn: () => listComments(project.id, role),
    }),
  ]);
  const canComment = can(role, 'review.comment');
  const members = canComment ? await mentionableMembers(project.teamId, user, role) : [];
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold text-creek-900">Network</h1>
        <RoleBadge role={role} />
      </div>
      <p className="max-w-3xl text-sm text-creek-700">
        The whole water system: sources, ram outlets, tanks, take-offs and outlets joined by lines, pipes and valves.
        Solve it at the peak hour to see every flow and pressure, or let Runnel choose the least-cost pipe sizes from
        the team&apos;s price list.
      </p>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <Suspense fallback={<NetworkWorkspaceSkeleton />}>
          <NetworkWorkspace
            projectId={project.id}
            units={project.unitSystem}
            canEdit={can(role, 'design.edit')}
            canComment={canComment}
            members={members}
          />
        </Suspense>
      </HydrationBoundary>
    </div>
  );
}
