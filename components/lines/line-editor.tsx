'use client';

import { LoadError } from '@/components/ui/load-error';
import { useRouter } from 'next/navigation';
import { Button } from '@/components/ui/button';
import type { LineRecord } from '@/lib/data/lines';
import { useLineActions } from './line-actions';
import { useQuery } from '@tanstack/react-query';
import { lineQuery, lineSiteContextQuery, lineStationsQuery } from '@/lib/queries/lines';
import { Skeleton } from '@/components/ui/panel';
import { LineWorkspace } from './line-workspace';
import { type UnitSystem } from '@/lib/units';

export interface LineEditorProps {
  lineId: string;
  projectName: string;
  unitSystem: UnitSystem;
  canEdit: boolean;
  /** May comment on the working copy (pins on the profile). */
  canComment: boolean;
  /** Team members the comment form can mention. */
  members: { id: string; name: string }[];
}

/** Loads the line and its stations (prefetched on the server), then opens the workspace. */
export function LineEditor({ lineId, projectName, unitSystem, canEdit, canComment, members }: LineEditorProps) {
  const line = useQuery(lineQuery(lineId));
  const stations = useQuery(lineStationsQuery(lineId));
  const context = useQuery(lineSiteContextQuery(lineId));
  if (line.isError || stations.isError || context.isError) {
    return (
      <LoadError
        what="The line"
        onRetry={() => {
          void line.refetch();
          void stations.refetch();
          void context.refetch();
        }}
      />
    );
  }
  if (!line.data || !stations.data || !context.data) return <LineEditorSkeleton />;
  if (stations.data.length < 2) {
    return <LineWithoutRoute line={line.data} canEdit={canEdit} />;
  }
  return (
    <LineWorkspace
      key={line.data.id}
      line={line.data}
      stations={stations.data}
      context={context.data}
      projectName={projectName}
      unitSystem={unitSystem}
      canEdit={canEdit}
      canComment={canComment}
      members={members}
    />
  );
}

export function LineEditorSkeleton() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading the line">
      <Skeleton className="h-8 w-80" />
      <div className="grid gap-3 sm:grid-cols-4">
        {[0, 1, 2, 3].map((i) => (
          <Skeleton key={i} className="h-20" />
        ))}
      </div>
      <Skeleton className="h-[520px] w-full" />
    </div>
  );
}

/** A line whose route was removed or emptied: its design is kept; it can still be deleted here. */
function LineWithoutRoute({ line, canEdit }: { line: LineRecord; canEdit: boolean }) {
  const router = useRouter();
  const actions = useLineActions(line.projectId);
  return (
    <div className="space-y-3">
      <h1 className="text-2xl font-semibold text-creek-900">{line.name}</h1>
      <p role="alert" className="text-sm text-clay-700">
        This line has no route with at least two stations any more (the route was removed or emptied). Its design is
        kept: survey the route again, or start a new line on a surveyed route{canEdit ? ' and delete this one' : ''}.
      </p>
      {canEdit && (
        <Button
          tone="quiet"
          className="text-clay-700"
          onClick={() =>
            actions.askDelete(
              {
                id: line.id,
                name: line.name,
                stretchCount: line.design.stretches.length,
                deviceCount: line.design.devices.length,
              },
              () => router.push(`/projects/${line.projectId}/lines`),
            )
          }
        >
          Delete this line
        </Button>
      )}
      {actions.dialog}
    </div>
  );
}
