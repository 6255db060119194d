import type { Metadata } from 'next';
import Link from 'next/link';
import { ImportWizard } from '@/components/routes/import/import-wizard';
import { Panel } from '@/components/ui/panel';
import { requireProjectPage } from '@/lib/auth/project-page';
import { can } from '@/lib/permissions';
import { ROLE_LABELS } from '@/lib/roles';

export const metadata: Metadata = { title: 'Import a survey' };

export default async function ImportPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { project, role } = await requireProjectPage(params);

  return (
    <div className="space-y-4">
      <div>
        <Link href={`/projects/${project.id}/routes`} className="text-sm text-creek-600 underline">
          ← Survey routes
        </Link>
        <h1 className="text-2xl font-semibold text-creek-900">Import a survey</h1>
      </div>
      {can(role, 'survey.edit') ? (
        <Panel>
          <ImportWizard projectId={project.id} units={project.unitSystem} timeZone={project.timeZone} />
        </Panel>
      ) : (
        <p role="status" className="rounded-md border border-creek-100 bg-white p-4 text-sm text-creek-700">
          As {ROLE_LABELS[role].toLowerCase()} you can look at the routes of this project, but importing surveys is for
          surveyors, designers and owners.
        </p>
      )}
    </div>
  );
}
