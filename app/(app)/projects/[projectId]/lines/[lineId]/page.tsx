import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { LineEditor } from '@/components/lines/line-editor';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { listComments, mentionableMembers } from '@/lib/data/comments';
import { lineFeedContext } from '@/lib/data/line-context';
import { getLine, stationsOfLine } from '@/lib/data/lines';
import { getProject } from '@/lib/data/projects';
import { can } from '@/lib/permissions';
import { lineKeys } from '@/lib/queries/lines';
import { reviewKeys } from '@/lib/queries/reviews';
import { getQueryClient } from '@/lib/queries/query-client';
import { uuid } from '@/lib/validations/common';
import { LineEditorSkeleton } from '@/components/lines/line-editor';

export const metadata: Metadata = { title: 'Line' };

const Params = z.strictObject({ projectId: uuid('Project id'), lineId: uuid('Line id') });

export default async function LinePage({ params }: { params: Promise<{ projectId: string; lineId: string }> }) {
  const parsed = Params.safeParse(await params);
  if (!parsed.success) notFound();
  const user = await requireUser();
  const project = await getProject(parsed.data.projectId);
  const role = await requireTeamRole(user, project?.teamId ?? null, 'design.view');
  const line = await getLine(parsed.data.lineId);
  if (!project || !line || line.projectId !== project.id) notFound();

  const queryClient = getQueryClient();
  queryClient.setQueryData(lineKeys.one(line.id), line);
  queryClient.setQueryData(lineKeys.siteContext(line.id), await lineFeedContext(project.id, line.id));
  if (line.routeId) {
    const stations = await stationsOfLine(line.routeId, line).catch(() => []);
    queryClient.setQueryData(lineKeys.stations(line.id), stations);
  }
  await queryClient.prefetchQuery({
    queryKey: reviewKeys.comments(project.id),
    queryFn: () => listComments(project.id, role),
  });
  const canComment = can(role, 'review.comment');
  const members = canComment ? await mentionableMembers(project.teamId, user, role) : [];

  return (
    <HydrationBoundary state={dehydrate(queryClient)}>
      <Suspense fallback={<LineEditorSkeleton />}>
        <LineEditor
          lineId={line.id}
          projectName={project.name}
          unitSystem={project.unitSystem}
          canEdit={can(role, 'design.edit')}
          canComment={canComment}
          members={members}
        />
      </Suspense>
    </HydrationBoundary>
  );
}
