import type { Metadata } from 'next';
import { ProjectDangerZone } from '@/components/projects/project-danger-zone';
import { NextStepCard } from '@/components/projects/next-step-card';
import { ProjectDetailsForm } from '@/components/projects/project-details-form';
import { UpcomingSections } from '@/components/projects/upcoming-sections';
import { Panel } from '@/components/ui/panel';
import { requireProjectPage } from '@/lib/auth/project-page';
import { projectProgress } from '@/lib/data/projects';
import { can } from '@/lib/permissions';
import { nextStepOf } from '@/lib/projects/next-step';

export const metadata: Metadata = { title: 'Project' };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { project, role } = await requireProjectPage(params);
  const may = { survey: can(role, 'survey.edit'), design: can(role, 'design.edit') };
  const step = may.survey || may.design ? nextStepOf(project.id, await projectProgress(project.id), may) : null;

  return (
    <div className="space-y-6">
      {step && <NextStepCard step={step} />}
      <Panel title="Project details">
        <ProjectDetailsForm project={project} editable={can(role, 'project.edit')} />
      </Panel>
      <UpcomingSections />
      {(can(role, 'project.edit') || can(role, 'project.delete')) && (
        <ProjectDangerZone
          project={project}
          canArchive={can(role, 'project.edit')}
          canDelete={can(role, 'project.delete')}
        />
      )}
    </div>
  );
}
