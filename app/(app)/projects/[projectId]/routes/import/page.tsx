import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { ImportWizard } from '@/components/routes/import/import-wizard';
import { Panel } from '@/components/ui/panel';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { getProject } from '@/lib/data/projects';
import { can } from '@/lib/permissions';
import { ROLE_LABELS } from '@/lib/roles';
import { ProjectParams } from '@/lib/validations/projects';

export const metadata: Metadata = { title: 'Import a survey' };

export default async function ImportPage({ params }: { params: Promise<{ projectId: string }> }) {
  const parsed = ProjectParams.safeParse(await params);
  if (!parsed.success) notFound();
  const user = await requireUser();
  const project = await getProject(parsed.data.projectId);
  const role = await requireTeamRole(user, project?.teamId ?? null, 'project.view');
  if (!project) notFound();

  return (
    <div className="space-y-4">
      <div>
        <Link href={`/projects/${project.id}/routes`} className="text-sm text-creek-600 underline">← Survey routes</Link>
        <h1 className="text-2xl font-semibold text-creek-900">Import a survey</h1>
      </div>
      {can(role, 'survey.edit') ? (
        <Panel>
          <ImportWizard projectId={project.id} units={project.unitSystem} />
        </Panel>
      ) : (
        <p role="status" className="rounded-md border border-creek-100 bg-white p-4 text-sm text-creek-700">
          As {ROLE_LABELS[role].toLowerCase()} you can look at the routes of this project, but importing surveys is for surveyors, designers and owners.
        </p>
      )}
    </div>
  );
}
