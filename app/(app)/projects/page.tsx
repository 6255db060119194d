import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import { NewProjectForm } from '@/components/projects/new-project-form';
import { ProjectsTable } from '@/components/projects/projects-table';
import { ProjectsTableSkeleton } from '@/components/projects/projects-table-skeleton';
import { Panel } from '@/components/ui/panel';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { currentTeam } from '@/lib/current-team';
import { listProjects } from '@/lib/data/projects';
import { can } from '@/lib/permissions';
import { projectKeys } from '@/lib/queries/projects';
import { getQueryClient } from '@/lib/queries/query-client';

export const metadata: Metadata = { title: 'Projects' };

export default async function ProjectsPage() {
  const user = await requireUser();
  const { team } = await currentTeam(user.id);
  if (!team) return <p>You do not belong to a team yet.</p>;
  const role = await requireTeamRole(user, team.id, 'project.view');

  const queryClient = getQueryClient();
  await queryClient.prefetchQuery({ queryKey: projectKeys.team(team.id), queryFn: () => listProjects(team.id) });

  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-creek-900">Projects</h1>
        <p className="text-sm text-creek-700">Water systems of {team.name}.</p>
      </div>
      {can(role, 'project.create') && (
        <Panel title="Start a project">
          <NewProjectForm teamId={team.id} />
        </Panel>
      )}
      <HydrationBoundary state={dehydrate(queryClient)}>
        <Suspense fallback={<ProjectsTableSkeleton />}>
          <ProjectsTable teamId={team.id} />
        </Suspense>
      </HydrationBoundary>
    </div>
  );
}
