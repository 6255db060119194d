import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { RoutePhotos } from '@/components/photos/route-photos';
import { RouteEditor } from '@/components/routes/route/route-editor';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { listComments, mentionableMembers } from '@/lib/data/comments';
import { getProject } from '@/lib/data/projects';
import { listPhotos } from '@/lib/data/photos';
import { getRouteDetail } from '@/lib/data/routes';
import { can } from '@/lib/permissions';
import { photoKeys } from '@/lib/queries/photos';
import { getQueryClient } from '@/lib/queries/query-client';
import { reviewKeys } from '@/lib/queries/reviews';
import { routeKeys } from '@/lib/queries/routes';
import { uuid } from '@/lib/validations/common';

export const metadata: Metadata = { title: 'Survey route' };

const Params = z.strictObject({ projectId: uuid('Project id'), routeId: uuid('Route id') });

export default async function RoutePage({ params }: { params: Promise<{ projectId: string; routeId: string }> }) {
  const parsed = Params.safeParse(await params);
  if (!parsed.success) notFound();
  const user = await requireUser();
  const project = await getProject(parsed.data.projectId);
  const role = await requireTeamRole(user, project?.teamId ?? null, 'design.view');
  const detail = await getRouteDetail(parsed.data.routeId);
  if (!project || !detail || detail.route.projectId !== project.id) notFound();
  const queryClient = getQueryClient();
  queryClient.setQueryData(routeKeys.one(detail.route.id), detail);
  await Promise.all([
    queryClient.prefetchQuery({ queryKey: photoKeys.project(project.id), queryFn: () => listPhotos(project.id) }),
    queryClient.prefetchQuery({ queryKey: reviewKeys.comments(project.id), queryFn: () => listComments(project.id, role) }),
  ]);
  const canComment = can(role, 'comment.route');
  const members = await mentionableMembers(project.teamId, user, role);

  return (
    <div className="space-y-4">
      <Link href={`/projects/${project.id}/routes`} className="text-sm text-creek-600 underline">← Survey routes</Link>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <RouteEditor projectId={project.id} routeId={detail.route.id} units={project.unitSystem} editable={can(role, 'survey.edit')} canComment={canComment} canCommentAnywhere={can(role, 'review.comment')} members={members} />
        <RoutePhotos projectId={project.id} routeId={detail.route.id} units={project.unitSystem} editable={can(role, 'survey.edit')} />
      </HydrationBoundary>
    </div>
  );
}
