import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import { LinesTable } from '@/components/lines/lines-table';
import { NewLineForm } from '@/components/lines/new-line-form';
import { Panel } from '@/components/ui/panel';
import { requireProjectPage } from '@/lib/auth/project-page';
import { listRouteChoices } from '@/lib/data/line-routes';
import { listLines } from '@/lib/data/lines';
import { can } from '@/lib/permissions';
import { lineKeys } from '@/lib/queries/lines';
import { getQueryClient } from '@/lib/queries/query-client';
import { LinesTableSkeleton } from '@/components/lines/lines-table';

export const metadata: Metadata = { title: 'Lines' };

export default async function LinesPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { project, role } = await requireProjectPage(params, 'design.view');
  const queryClient = getQueryClient();
  await queryClient.prefetchQuery({ queryKey: lineKeys.project(project.id), queryFn: () => listLines(project.id) });
  const editable = can(role, 'design.edit');
  const routes = editable ? await listRouteChoices(project.id) : [];

  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-creek-900">Lines</h1>
        <p className="text-sm text-creek-700">
          Pipelines laid along the surveyed routes: pipe and class per stretch, valves and tanks, checked on the long
          profile.
        </p>
      </div>
      {editable && (
        <Panel title="Start a line">
          <NewLineForm projectId={project.id} routes={routes} unitSystem={project.unitSystem} />
        </Panel>
      )}
      <HydrationBoundary state={dehydrate(queryClient)}>
        <Suspense fallback={<LinesTableSkeleton />}>
          <LinesTable projectId={project.id} canEdit={editable} />
        </Suspense>
      </HydrationBoundary>
    </div>
  );
}
