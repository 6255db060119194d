'use client';

import { drainPointsOf, type LineWinterPlan, type WinterFix } from '@/lib/lines/winter';
import type { LineDesign } from '@/lib/validations/line-design';
import { type DisplayUnits, formatQuantity } from '@/lib/units';

type Change = (next: LineDesign, label: string) => string | null;

const SELECT = 'mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1 text-sm disabled:bg-creek-50';

function fixLabel(fix: WinterFix, units: DisplayUnits): string {
  return fix.kind === 'drain-for-winter'
    ? 'Drain it for winter'
    : `Lay it deeper: ${formatQuantity('depth', fix.coverM, units.system)} of cover`;
}

/**
 * How the line is kept through winter: the choice, the cover against the frost depth, and the drain points of a drained
 * line.
 */
export function WinterPanel({
  design,
  plan,
  units,
  change,
  canEdit,
  onProblem,
}: {
  design: LineDesign;
  plan: LineWinterPlan;
  units: DisplayUnits;
  change: Change;
  canEdit: boolean;
  onProblem: (problem: string | null) => void;
}) {
  function apply(fix: WinterFix) {
    onProblem(
      fix.kind === 'drain-for-winter'
        ? change({ ...design, winter: { treatment: 'drained-for-winter' } }, 'drain the line for winter')
        : change(
            { ...design, settings: { ...design.settings, defaultCoverM: fix.coverM } },
            `lay the pipe ${formatQuantity('depth', fix.coverM, units.system)} deep`,
          ),
    );
  }
  const drained = plan.treatment === 'drained-for-winter';
  const drains = drainPointsOf(plan);
  return (
    <div className="grid gap-4 md:grid-cols-2" data-testid="winter-panel">
      <div className="space-y-2">
        <label className="block text-xs font-medium text-creek-900" htmlFor="winter-treatment">
          Through winter the line is
        </label>
        <select
          id="winter-treatment"
          className={SELECT}
          disabled={!canEdit}
          value={plan.treatment}
          onChange={(e) =>
            onProblem(
              change(
                { ...design, winter: { treatment: e.target.value as LineWinterPlan['treatment'] } },
                'change the winter treatment',
              ),
            )
          }
        >
          <option value="buried-below-frost">Buried below frost depth (stays full)</option>
          <option value="drained-for-winter">Drained for winter</option>
        </select>
        <dl className="space-y-0.5 text-sm text-creek-800">
          <div className="flex justify-between gap-2">
            <dt>Site frost depth</dt>
            <dd className="tabular">
              {plan.frostDepthM === null
                ? 'not set for the project'
                : formatQuantity('depth', plan.frostDepthM, units.system)}
            </dd>
          </div>
          <div className="flex justify-between gap-2">
            <dt>Least cover over the pipe</dt>
            <dd className="tabular">
              {formatQuantity('depth', plan.shallowestCoverM, units.system)} at ch.{' '}
              {formatQuantity('chainage', plan.shallowestCoverAtM, units.system)}
            </dd>
          </div>
        </dl>
        {plan.frostDepthM === null && (
          <p className="text-xs text-creek-600">
            Set the frost depth on the project&apos;s page so Runnel can check the cover.
          </p>
        )}
        {!plan.chosen && <p className="text-xs text-creek-600">Not chosen yet: taken as buried below frost depth.</p>}
      </div>
      <div className="space-y-2">
        {plan.warning && (
          <div
            role="alert"
            className="rounded-md border border-clay-100 bg-clay-50 p-3 text-sm text-clay-700"
            data-testid="winter-warning"
          >
            <p className="font-semibold">Shallower than frost</p>
            <p>
              {formatQuantity('depth', plan.shallowestCoverM, units.system)} of cover at ch.{' '}
              {formatQuantity('chainage', plan.shallowestCoverAtM, units.system)} against a frost depth of{' '}
              {formatQuantity('depth', plan.frostDepthM ?? 0, units.system)}. {plan.warning.message}
            </p>
            {canEdit && (
              <div className="mt-2 flex flex-wrap gap-2">
                {plan.warning.fixes.map((fix) => (
                  <button
                    key={fix.kind}
                    type="button"
                    className="rounded-md border border-clay-200 bg-white px-2 py-1 text-xs font-medium"
                    onClick={() => apply(fix)}
                  >
                    {fixLabel(fix, units)}
                  </button>
                ))}
              </div>
            )}
          </div>
        )}
        {drained && (
          <div>
            <p className="text-sm font-semibold text-creek-900">Drain points ({drains.length})</p>
            <ul className="list-disc pl-5 text-sm text-creek-800" data-testid="drain-points">
              {drains.map((p) => (
                <li key={p.chainageM}>
                  ch. {formatQuantity('chainage', p.chainageM, units.system)}: {p.place}, pipe at{' '}
                  {formatQuantity('length', p.elevationM, units.system)}
                </li>
              ))}
              {drains.length === 0 && <li>No low point stands out on this profile: drain at the lower end.</li>}
            </ul>
            <p className="mt-1 text-xs text-creek-600">
              Low points of the pipe profile. The drain-down task on the Lift &amp; storage page lists them when the
              year&apos;s tasks are made.
            </p>
          </div>
        )}
      </div>
    </div>
  );
}
