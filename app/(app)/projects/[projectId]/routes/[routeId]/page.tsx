import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { RoutePhotos } from '@/components/photos/route-photos';
import { RouteEditor } from '@/components/routes/route/route-editor';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { listComments, mentionableMembers } from '@/lib/data/comments';
import { getProject } from '@/lib/data/projects';
import { listPhotos } from '@/lib/data/photos';
import { getRoutePointsPage, getRouteView } from '@/lib/data/routes';
import { can } from '@/lib/permissions';
import { photoKeys } from '@/lib/queries/photos';
import { getQueryClient } from '@/lib/queries/query-client';
import { reviewKeys } from '@/lib/queries/reviews';
import { ROUTE_PAGE_SIZE, routeKeys } from '@/lib/queries/routes';
import { uuid } from '@/lib/validations/common';
import { RouteEditorSkeleton } from '@/components/routes/route/route-editor-skeleton';
import { RoutePhotosSkeleton } from '@/components/photos/route-photos';

export const metadata: Metadata = { title: 'Survey route' };

const Params = z.strictObject({ projectId: uuid('Project id'), routeId: uuid('Route id') });

export default async function RoutePage({ params }: { params: Promise<{ projectId: string; routeId: string }> }) {
  const parsed = Params.safeParse(await params);
  if (!parsed.success) notFound();
  const user = await requireUser();
  const project = await getProject(parsed.data.projectId);
  const role = await requireTeamRole(user, project?.teamId ?? null, 'design.view');
  // What the first screen draws, never the whole route: the view (header, thinned profile, plan,
  // proposals) and the first page of rows.
  const [view, firstPage] = await Promise.all([
    getRouteView(parsed.data.routeId),
    getRoutePointsPage(parsed.data.routeId, 0, ROUTE_PAGE_SIZE),
  ]);
  if (!project || !view || view.route.projectId !== project.id) notFound();
  const queryClient = getQueryClient();
  queryClient.setQueryData(routeKeys.view(view.route.id), view);
  queryClient.setQueryData(routeKeys.page(view.route.id, 0, ROUTE_PAGE_SIZE), firstPage);
  await Promise.all([
    queryClient.prefetchQuery({ queryKey: photoKeys.project(project.id), queryFn: () => listPhotos(project.id) }),
    queryClient.prefetchQuery({
      queryKey: reviewKeys.comments(project.id),
      queryFn: () => listComments(project.id, role),
    }),
  ]);
  const canComment = can(role, 'comment.route');
  const members = await mentionableMembers(project.teamId, user, role);

  return (
    <div className="space-y-4">
      <Link href={`/projects/${project.id}/routes`} className="text-sm text-creek-600 underline">
        ← Survey routes
      </Link>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <Suspense fallback={<RouteEditorSkeleton />}>
          <RouteEditor
            projectId={project.id}
            routeId={view.route.id}
            units={project.unitSystem}
            editable={can(role, 'survey.edit')}
            canComment={canComment}
            canCommentAnywhere={can(role, 'review.comment')}
            members={members}
          />
        </Suspense>
        <Suspense fallback={<RoutePhotosSkeleton />}>
          <RoutePhotos
            projectId={project.id}
            routeId={view.route.id}
            units={project.unitSystem}
            editable={can(role, 'survey.edit')}
          />
        </Suspense>
      </HydrationBoundary>
    </div>
  );
}
