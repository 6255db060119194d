'use client';

import { LoadError } from '@/components/ui/load-error';
import { useQuery } from '@tanstack/react-query';
import { Panel } from '@/components/ui/panel';
import { liftSummaryQuery } from '@/lib/queries/lift';
import type { UnitSystem } from '@/lib/units';
import { DemandTable } from './demand-table';
import { LiftWorkspaceSkeleton } from './lift-workspace-skeleton';
import { RamSiteCard } from './ram-site-card';
import { RamSiteForm } from './ram-site-form';
import { SeasonalTaskList } from './seasonal-task-list';
import { SourceYield } from './source-yield';
import { StoragePanel } from './storage-panel';

export interface LiftWorkspaceProps {
  projectId: string;
  units: UnitSystem;
  /** 'design.edit': ram sites, sources, tanks, demand, tasks. */
  canEdit: boolean;
  /** 'yield.log': source yield readings (surveyors too). */
  canLogYield: boolean;
}

const SECTIONS = [
  { id: 'ram', label: 'Ram pump' },
  { id: 'yield', label: 'Source yield' },
  { id: 'demand', label: 'Demand' },
  { id: 'storage', label: 'Storage' },
  { id: 'seasons', label: 'Seasons' },
];

/** The lift and storage page: what the ram delivers and how long the tank takes first, then the rest. */
export function LiftWorkspace({ projectId, units, canEdit, canLogYield }: LiftWorkspaceProps) {
  const { data: lift, isError, refetch } = useQuery(liftSummaryQuery(projectId));
  if (isError) return <LoadError what="The lift figures" onRetry={() => void refetch()} />;
  if (!lift) return <LiftWorkspaceSkeleton />;
  const sources = lift.sources.map((view) => ({
    id: view.source.id,
    name: view.source.name,
    designYieldM3s: view.design.ok ? view.design.value.designYieldM3s : null,
  }));
  const tanks = lift.tanks.map((view) => ({ id: view.tank.id, name: view.tank.name, volumeM3: view.tank.volumeM3 }));

  return (
    <div className="space-y-6">
      <nav aria-label="On this page" className="flex flex-wrap gap-2 text-sm">
        {SECTIONS.map((section) => (
          <a
            key={section.id}
            href={`#${section.id}`}
            className="rounded-full border border-creek-200 px-3 py-1 text-creek-800 hover:bg-creek-50"
          >
            {section.label}
          </a>
        ))}
      </nav>
      <section id="ram" aria-label="Ram pump" className="space-y-4">
        {lift.ramSites.length === 0 && (
          <Panel title="Ram pump">
            <p className="text-sm text-creek-700">
              No ram site yet.
              {canEdit ? ' Enter the fall, the lift and the pipes below to see what it will deliver.' : ''}
            </p>
          </Panel>
        )}
        {lift.ramSites.map((view) => (
          <RamSiteCard
            key={view.site.id}
            projectId={projectId}
            view={view}
            units={units}
            canEdit={canEdit}
            sources={sources}
            tanks={tanks}
            routes={lift.routes}
          />
        ))}
        {canEdit && (
          <details
            className="rounded-lg border border-creek-100 bg-white p-4 shadow-sm sm:p-5"
            open={lift.ramSites.length === 0}
          >
            <summary className="cursor-pointer text-base font-semibold text-creek-900">
              {lift.ramSites.length === 0 ? 'Add a ram site' : 'Add another ram site'}
            </summary>
            <div className="mt-4">
              <RamSiteForm
                projectId={projectId}
                units={units}
                site={null}
                sources={sources}
                tanks={tanks}
                routes={lift.routes}
              />
            </div>
          </details>
        )}
      </section>
      <section id="yield">
        <Panel title="Source yield">
          <SourceYield
            projectId={projectId}
            views={lift.sources}
            units={units}
            canEdit={canEdit}
            canLog={canLogYield}
          />
        </Panel>
      </section>
      <section id="demand">
        <Panel title="Daily demand">
          <DemandTable projectId={projectId} view={lift.demand} units={units} canEdit={canEdit} />
        </Panel>
      </section>
      <section id="storage">
        <Panel title="Storage">
          <StoragePanel projectId={projectId} tanks={lift.tanks} sources={sources} units={units} canEdit={canEdit} />
        </Panel>
      </section>
      <section id="seasons">
        <Panel title="Seasonal tasks">
          <SeasonalTaskList projectId={projectId} tasks={lift.seasonalTasks} canEdit={canEdit} />
        </Panel>
      </section>
    </div>
  );
}
