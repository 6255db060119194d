'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { useConfirm } from '@/components/ui/confirm-dialog';
import type { RouteOption } from '@/lib/lift/records';
import type { RamSiteView } from '@/lib/lift/summary';
import { useDeleteRamSite } from '@/lib/queries/lift';
import { formatQuantity, type UnitSystem } from '@/lib/units';
import { CommissioningLog } from './commissioning-log';
import { RamAnswer } from './ram-answer';
import { RamSiteForm, type RamSiteFormProps } from './ram-site-form';

export interface RamSiteCardProps {
  projectId: string;
  view: RamSiteView;
  units: UnitSystem;
  canEdit: boolean;
  sources: RamSiteFormProps['sources'];
  tanks: RamSiteFormProps['tanks'];
  routes: readonly RouteOption[];
}

/** One ram site: the answer first, then the site as entered, then its commissioning log. */
export function RamSiteCard({ projectId, view, units, canEdit, sources, tanks, routes }: RamSiteCardProps) {
  const [editing, setEditing] = useState(false);
  const remove = useDeleteRamSite(projectId);
  const confirm = useConfirm();
  const { site } = view;
  return (
    <article
      className="space-y-4 rounded-lg border border-creek-100 bg-white p-4 shadow-sm sm:p-5"
      aria-labelledby={`ram-${site.id}`}
    >
      {confirm.dialog}
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h2 id={`ram-${site.id}`} className="text-lg font-semibold text-creek-900">
            {site.name}
          </h2>
          <p className="text-sm text-creek-700">
            Fall {formatQuantity('head', site.fallM, units)}, lift {formatQuantity('head', site.liftM, units)}, drive
            flow {formatQuantity('flow', site.driveFlowM3s, units)}; drive pipe{' '}
            {formatQuantity('length', site.drivePipe.lengthM, units)} of{' '}
            {formatQuantity('diameter', site.drivePipe.insideDiameterM, units, 2)} {site.drivePipe.material}; delivery
            pipe {formatQuantity('length', view.deliveryLengthM, units)}
            {view.routeName ? ` along ${view.routeName}` : ''}.
            {view.source ? ` Drive water from ${view.source.name}.` : ''}
          </p>
        </div>
        {canEdit && !editing && (
          <div className="flex gap-2">
            <Button tone="quiet" onClick={() => setEditing(true)}>
              Edit site
            </Button>
            <Button
              tone="quiet"
              onClick={() =>
                confirm.ask({
                  title: `Delete the ram site “${site.name}”?`,
                  body: (
                    <>
                      <p>
                        The site goes with its commissioning log ({view.commissioning.length}{' '}
                        {view.commissioning.length === 1 ? 'reading' : 'readings'}) and its pump in the network, with
                        the pipes joined to it there.
                      </p>
                      <p>
                        Lines that start at this ram keep their design but cannot be analysed until you pick another
                        start for them. Its source and tank stay.
                      </p>
                      <p>This cannot be undone.</p>
                    </>
                  ),
                  confirmLabel: 'Delete site',
                  onConfirm: () => remove.mutateAsync(site.id),
                })
              }
            >
              Delete site
            </Button>
          </div>
        )}
      </div>
      {editing && (
        <RamSiteForm
          projectId={projectId}
          units={units}
          site={site}
          sources={sources}
          tanks={tanks}
          routes={routes}
          onDone={() => setEditing(false)}
        />
      )}
      {view.plan.ok ? (
        <RamAnswer plan={view.plan.value} units={units} tank={view.tank} />
      ) : (
        <p role="alert" className="rounded-md border border-clay-100 bg-clay-50 px-3 py-2 text-sm text-clay-700">
          This site cannot be planned as entered: {view.plan.error}
        </p>
      )}
      <section aria-labelledby={`commissioning-${site.id}`} className="space-y-3 border-t border-creek-100 pt-4">
        <h3 id={`commissioning-${site.id}`} className="text-base font-semibold text-creek-900">
          Commissioning log
        </h3>
        <CommissioningLog projectId={projectId} view={view} units={units} canEdit={canEdit} />
      </section>
    </article>
  );
}
