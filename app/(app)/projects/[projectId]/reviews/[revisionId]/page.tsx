import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { RevisionActions } from '@/components/reviews/revision-actions';
import { RevisionStatusBadge } from '@/components/reviews/revision-status-badge';
import { RevisionWorkspace } from '@/components/reviews/revision-workspace';
import { requireProjectPage } from '@/lib/auth/project-page';
import { listComments, mentionableMembers } from '@/lib/data/comments';
import { getRevision } from '@/lib/data/revisions';
import { AppError } from '@/lib/errors';
import { can } from '@/lib/permissions';
import { reviewKeys } from '@/lib/queries/reviews';
import { getQueryClient } from '@/lib/queries/query-client';
import { revisionStamp, stampRows } from '@/lib/review/stamp';
import { uuid } from '@/lib/validations/common';
import { RevisionWorkspaceSkeleton } from '@/components/reviews/revision-workspace';

export const metadata: Metadata = { title: 'Revision' };

const Params = z.strictObject({ projectId: uuid('Project id'), revisionId: uuid('Revision id') });

export default async function RevisionPage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string; revisionId: string }>;
  searchParams: Promise<{ line?: string }>;
}) {
  const parsed = Params.safeParse(await params);
  if (!parsed.success) notFound();
  const { project, role, user } = await requireProjectPage(Promise.resolve({ projectId: parsed.data.projectId }));
  const revision = await getRevision(parsed.data.revisionId, role).catch((error) => {
    if (error instanceof AppError && error.code === 'not_found') notFound();
    throw error;
  });
  if (revision.projectId !== project.id) notFound();
  const { line: wantedLine } = await searchParams;
  const lineId = revision.snapshot.lines.find((l) => l.id === wantedLine)?.id ?? revision.snapshot.lines[0]?.id ?? null;
  const stamp = revisionStamp({
    number: revision.number,
    status: revision.status,
    designerName: revision.createdBy?.name ?? null,
    reviewerName: revision.reviewedBy?.name ?? null,
    reviewedAt: revision.reviewedAt,
  });
  const canComment = can(role, 'review.comment');
  const members = canComment ? await mentionableMembers(project.teamId, user, role) : [];

  const queryClient = getQueryClient();
  await queryClient.prefetchQuery({
    queryKey: reviewKeys.comments(project.id),
    queryFn: () => listComments(project.id, role),
  });

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="space-y-1">
          <Link href={`/projects/${project.id}/reviews`} className="text-sm text-creek-600 underline">
            ← All revisions
          </Link>
          <h1 className="flex items-center gap-3 text-2xl font-semibold text-creek-900">
            Revision {revision.number} <RevisionStatusBadge status={revision.status} />
          </h1>
          {revision.note && <p className="text-sm text-creek-800">{revision.note}</p>}
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-sm" data-testid="title-block">
            {stampRows(stamp).map(([k, v]) => (
              <div key={k} className="contents">
                <dt className="text-creek-600">{k}</dt>
                <dd className="text-creek-900">{v}</dd>
              </div>
            ))}
          </dl>
          {!stamp.forConstruction && (
            <p
              className="inline-block rounded border-2 border-clay-600 px-2 py-0.5 text-sm font-bold text-clay-700"
              data-testid="not-for-construction"
            >
              Not for construction: {stamp.markReason}
            </p>
          )}
        </div>
        <RevisionActions revision={revision} role={role} userId={user.id} />
      </div>
      {revision.snapshot.lines.length > 1 && (
        <nav aria-label="Lines of this revision" className="flex flex-wrap gap-2 text-sm">
          {revision.snapshot.lines.map((l) => (
            <Link
              key={l.id}
              href={`?line=${l.id}`}
              aria-current={l.id === lineId ? 'page' : undefined}
              className={`rounded-md px-3 py-1 ${l.id === lineId ? 'bg-creek-700 text-white' : 'border border-creek-200 text-creek-800 hover:bg-creek-50'}`}
            >
              {l.name}
            </Link>
          ))}
        </nav>
      )}
      <HydrationBoundary state={dehydrate(queryClient)}>
        <Suspense fallback={<RevisionWorkspaceSkeleton />}>
          <RevisionWorkspace
            key={lineId ?? 'none'}
            revision={revision}
            lineId={lineId}
            stamp={stamp}
            canComment={canComment}
            members={members}
          />
        </Suspense>
      </HydrationBoundary>
    </div>
  );
}
