'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { Panel } from '@/components/ui/panel';
import type { ProjectSummary } from '@/lib/data/projects';
import { useDeleteProject, useUpdateProject } from '@/lib/queries/projects';

interface Props {
  project: ProjectSummary;
  canArchive: boolean;
  canDelete: boolean;
}

export function ProjectDangerZone({ project, canArchive, canDelete }: Props) {
  const router = useRouter();
  const update = useUpdateProject(project.id);
  const remove = useDeleteProject(project.id, project.teamId);
  const [confirmName, setConfirmName] = useState('');
  const [error, setError] = useState<string | null>(null);

  return (
    <Panel title="Archive or delete">
      <div className="space-y-4 text-sm">
        {canArchive && (
          <div className="flex flex-wrap items-center gap-3">
            <Button
              tone="quiet"
              disabled={update.isPending}
              onClick={async () => {
                await update.mutateAsync({ archived: !project.archived }).catch((e: Error) => setError(e.message));
                router.refresh();
              }}
            >
              {project.archived ? 'Bring back from archive' : 'Archive project'}
            </Button>
            <span className="text-creek-700">Archived projects stay readable but leave the main list.</span>
          </div>
        )}
        {canDelete && (
          <form
            className="space-y-2 rounded-md border border-clay-100 bg-clay-50/50 p-3"
            onSubmit={async (e) => {
              e.preventDefault();
              try {
                await remove.mutateAsync();
                router.push('/projects');
                router.refresh();
              } catch (err) {
                setError(err instanceof Error ? err.message : 'Not deleted.');
              }
            }}
          >
            <label htmlFor="confirm-delete" className="block font-medium text-clay-700">
              Delete for good: type the project name, <strong>{project.name}</strong>, to confirm
            </label>
            <input
              id="confirm-delete"
              value={confirmName}
              onChange={(e) => setConfirmName(e.target.value)}
              className="w-full max-w-sm rounded-md border border-clay-100 px-3 py-1.5"
              autoComplete="off"
            />
            <Button type="submit" tone="danger" disabled={confirmName !== project.name || remove.isPending}>
              Delete project
            </Button>
          </form>
        )}
        <FormMessage message={error} />
      </div>
    </Panel>
  );
}
