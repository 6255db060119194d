import type { ReactNode } from 'react';
import { notFound } from 'next/navigation';
import { ProjectNav } from '@/components/projects/project-nav';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { getProject } from '@/lib/data/projects';
import { ProjectParams } from '@/lib/validations/projects';

export default async function ProjectLayout({ children, params }: { children: ReactNode; params: Promise<{ projectId: string }> }) {
  const parsed = ProjectParams.safeParse(await params);
  if (!parsed.success) notFound();
  const user = await requireUser();
  const project = await getProject(parsed.data.projectId);
  await requireTeamRole(user, project?.teamId ?? null, 'project.view');
  if (!project) notFound();
  return (
    <div className="space-y-5">
      <div>
        <p className="text-xs uppercase tracking-wide text-creek-600">Project</p>
        <p className="text-lg font-semibold text-creek-900">{project.name}</p>
      </div>
      <ProjectNav projectId={project.id} />
      {children}
    </div>
  );
}
