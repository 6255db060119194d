import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import { LiftWorkspace } from '@/components/lift/lift-workspace';
import { RoleBadge } from '@/components/ui/role-badge';
import { requireProjectPage } from '@/lib/auth/project-page';
import { getLiftSummary } from '@/lib/data/lift-summary';
import { can } from '@/lib/permissions';
import { liftKeys } from '@/lib/queries/lift';
import { getQueryClient } from '@/lib/queries/query-client';
import { LiftWorkspaceSkeleton } from '@/components/lift/lift-workspace-skeleton';

export const metadata: Metadata = { title: 'Lift & storage' };

export default async function LiftPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { project, role } = await requireProjectPage(params, 'design.view');

  const queryClient = getQueryClient();
  await queryClient.prefetchQuery({
    queryKey: liftKeys.summary(project.id),
    queryFn: () => getLiftSummary(project.id),
  });

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold text-creek-900">Lift &amp; storage</h1>
        <RoleBadge role={role} />
      </div>
      <p className="max-w-3xl text-sm text-creek-700">
        How much the ram delivers and how long it takes to fill the tank, from the fall, lift and pipes; what the source
        reliably gives; what the uses take each day; and the tank that carries them. Figures in{' '}
        {project.unitSystem === 'us' ? 'US customary units' : 'metric units'}.
      </p>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <Suspense fallback={<LiftWorkspaceSkeleton />}>
          <LiftWorkspace
            projectId={project.id}
            units={project.unitSystem}
            canEdit={can(role, 'design.edit')}
            canLogYield={can(role, 'yield.log')}
          />
        </Suspense>
      </HydrationBoundary>
    </div>
  );
}
