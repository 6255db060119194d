import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { LinesTable } from '@/components/lines/lines-table';
import { NewLineForm } from '@/components/lines/new-line-form';
import { Panel } from '@/components/ui/panel';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { listRouteChoices } from '@/lib/data/line-routes';
import { listLines } from '@/lib/data/lines';
import { getProject } from '@/lib/data/projects';
import { can } from '@/lib/permissions';
import { lineKeys } from '@/lib/queries/lines';
import { getQueryClient } from '@/lib/queries/query-client';
import { ProjectParams } from '@/lib/validations/projects';

export const metadata: Metadata = { title: 'Lines' };

export default async function LinesPage({ params }: { params: Promise<{ projectId: string }> }) {
  const parsed = ProjectParams.safeParse(await params);
  if (!parsed.success) notFound();
  const user = await requireUser();
  const project = await getProject(parsed.data.projectId);
  const role = await requireTeamRole(user, project?.teamId ?? null, 'project.view');
  if (!project) notFound();
  const queryClient = getQueryClient();
  await queryClient.prefetchQuery({ queryKey: lineKeys.project(project.id), queryFn: () => listLines(project.id) });
  const editable = can(role, 'design.edit');
  const routes = editable ? await listRouteChoices(project.id) : [];

  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-creek-900">Lines</h1>
        <p className="text-sm text-creek-700">Pipelines laid along the surveyed routes: pipe and class per stretch, valves and tanks, checked on the long profile.</p>
      </div>
      {editable && (
        <Panel title="Start a line">
          <NewLineForm projectId={project.id} routes={routes} unitSystem={project.unitSystem} />
        </Panel>
      )}
      <HydrationBoundary state={dehydrate(queryClient)}>
        <LinesTable projectId={project.id} />
      </HydrationBoundary>
    </div>
  );
}
