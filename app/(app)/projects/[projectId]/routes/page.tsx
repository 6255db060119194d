import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import Link from 'next/link';
import { NewSketchRouteForm } from '@/components/routes/new-sketch-route-form';
import { RoutesList } from '@/components/routes/routes-list';
import { Panel } from '@/components/ui/panel';
import { requireProjectPage } from '@/lib/auth/project-page';
import { listRoutes } from '@/lib/data/routes';
import { can } from '@/lib/permissions';
import { getQueryClient } from '@/lib/queries/query-client';
import { routeKeys } from '@/lib/queries/routes';
import { RoutesListSkeleton } from '@/components/routes/routes-list';

export const metadata: Metadata = { title: 'Survey routes' };

export default async function RoutesPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { project, role } = await requireProjectPage(params, 'design.view');
  const queryClient = getQueryClient();
  await queryClient.prefetchQuery({ queryKey: routeKeys.project(project.id), queryFn: () => listRoutes(project.id) });
  const editable = can(role, 'survey.edit');

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold text-creek-900">Survey routes</h1>
          <p className="text-sm text-creek-700">
            The ground the lines are laid on: walked tracks, levelled runs and sketches.
          </p>
        </div>
        {editable && (
          <Link
            href={`/projects/${project.id}/routes/import`}
            className="rounded-md bg-creek-700 px-3.5 py-2 text-sm font-medium text-white hover:bg-creek-800"
          >
            Import a survey file
          </Link>
        )}
      </div>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <Suspense fallback={<RoutesListSkeleton />}>
          <RoutesList projectId={project.id} unitSystem={project.unitSystem} />
        </Suspense>
      </HydrationBoundary>
      {editable && (
        <Panel title="No survey yet?">
          <p className="mb-3 text-sm text-creek-700">
            Start an empty route and sketch it on the profile from a map or what you know of the ground; replace it with
            a survey later.
          </p>
          <NewSketchRouteForm projectId={project.id} />
        </Panel>
      )}
    </div>
  );
}
