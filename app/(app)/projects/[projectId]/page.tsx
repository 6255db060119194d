import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { ProjectDangerZone } from '@/components/projects/project-danger-zone';
import { ProjectDetailsForm } from '@/components/projects/project-details-form';
import { UpcomingSections } from '@/components/projects/upcoming-sections';
import { Panel } from '@/components/ui/panel';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { getProject } from '@/lib/data/projects';
import { can } from '@/lib/permissions';
import { ProjectParams } from '@/lib/validations/projects';

export const metadata: Metadata = { title: 'Project' };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const parsed = ProjectParams.safeParse(await params);
  if (!parsed.success) notFound();
  const user = await requireUser();
  const project = await getProject(parsed.data.projectId);
  const role = await requireTeamRole(user, project?.teamId ?? null, 'project.view');
  if (!project) notFound();

  return (
    <div className="space-y-6">
      <Panel title="Project details">
        <ProjectDetailsForm project={project} editable={can(role, 'project.edit')} />
      </Panel>
      <UpcomingSections />
      {(can(role, 'project.edit') || can(role, 'project.delete')) && (
        <ProjectDangerZone project={project} canArchive={can(role, 'project.edit')} canDelete={can(role, 'project.delete')} />
      )}
    </div>
  );
}
