'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Skeleton } from '@/components/ui/panel';
import { routeDetailQuery } from '@/lib/queries/routes';
import type { UnitSystem } from '@/lib/units';
import { RouteWorkspace } from './route-workspace';

export interface RouteEditorProps {
  routeId: string;
  units: UnitSystem;
  editable: boolean;
}

/** The route page: its data from the query cache, a fresh workspace each time the server's copy changes. */
export function RouteEditor({ routeId, units, editable }: RouteEditorProps) {
  const { data, isError, refetch } = useQuery(routeDetailQuery(routeId));
  const [sketchArea, setSketchArea] = useState({ lengthM: 1000, lowM: 0, highM: 100 });
  // Kept here so the table stays on its page when a decision brings a new version of the route.
  const [page, setPage] = useState(0);
  if (isError) {
    return (
      <p role="alert" className="text-sm text-clay-700">
        The route could not be loaded. <button className="underline" onClick={() => void refetch()}>Try again</button>
      </p>
    );
  }
  if (!data) return <Skeleton className="h-96 w-full" />;
  return <RouteWorkspace key={data.route.updatedAt} detail={data} units={units} editable={editable} sketchArea={sketchArea} onSketchArea={setSketchArea} page={page} onPage={setPage} />;
}
