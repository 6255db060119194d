import type { RamPlanResult } from '@/hydraulics/index';
import { formatDuration, formatNumber, formatPercent, formatQuantity, type UnitSystem } from '@/lib/units';
import { Caution, PlanChecks } from './plan-checks';
import { Readout } from './readout';

export interface RamAnswerProps {
  plan: RamPlanResult;
  units: UnitSystem;
  tank: { name: string; volumeM3: number } | null;
}

/** "How much will my ram deliver, and how long to fill my tank": the figures first, then why. */
export function RamAnswer({ plan, units, tank }: RamAnswerProps) {
  const fill = plan.tankFill;
  return (
    <div className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4" data-testid="ram-answer">
        <Readout
          emphasis
          label="Delivered a day"
          value={formatQuantity('flowPerDay', plan.deliveredFlowM3s, units)}
          detail={`${formatQuantity('flow', plan.deliveredFlowM3s, units)} · ${formatQuantity('flowPerHour', plan.deliveredFlowM3s, units)}`}
        />
        <Readout
          emphasis
          label="Tank fill time"
          value={fill && tank ? formatDuration(fill.fillTimeS) : '—'}
          detail={
            fill && tank
              ? `Fills ${tank.name} (${formatQuantity('volume', fill.volumeM3, units)}) from empty in ${formatDuration(fill.fillTimeS)}, outlets shut`
              : 'Choose the tank this ram fills to see its fill time'
          }
        />
        <Readout
          label="Waste flow"
          value={formatQuantity('flow', plan.wasteFlowM3s, units)}
          detail={`of ${formatQuantity('flow', plan.driveFlowUsedM3s, units)} drive flow used${plan.unusedSourceFlowM3s > 1e-9 ? `; ${formatQuantity('flow', plan.unusedSourceFlowM3s, units)} not used` : ''}`}
        />
        <Readout
          label="Efficiency"
          value={formatPercent(plan.efficiency)}
          detail={
            plan.efficiencyBasis === 'measured'
              ? 'measured at commissioning'
              : `from the table at ${formatNumber(plan.effectiveLiftToFallRatio, 1)} : 1`
          }
        />
      </div>
      <dl className="grid gap-x-6 gap-y-1 text-sm text-creek-800 sm:grid-cols-2">
        <div className="flex justify-between gap-3">
          <dt>Lift to fall</dt>
          <dd className="tabular">
            {formatNumber(plan.liftToFallRatio, 1)} : 1 static, {formatNumber(plan.effectiveLiftToFallRatio, 1)} : 1
            with friction
          </dd>
        </div>
        <div className="flex justify-between gap-3">
          <dt>Delivery head at the pump</dt>
          <dd className="tabular">
            {formatQuantity('head', plan.deliveryHeadM, units)} (friction{' '}
            {formatQuantity('head', plan.deliveryFrictionM, units)})
          </dd>
        </div>
        <div className="flex justify-between gap-3">
          <dt>Pumps</dt>
          <dd className="tabular">
            {plan.pumpCount}
            {plan.sizeClassId ? `, class ${plan.sizeClassId.replace('drive-', '')} drive` : ''}
          </dd>
        </div>
        <div className="flex justify-between gap-3">
          <dt>Efficiency basis</dt>
          <dd className="text-right text-xs">{plan.efficiencySource}</dd>
        </div>
      </dl>
      <SurgeCompare plan={plan} units={units} />
      <div>
        <h3 className="mb-2 text-sm font-semibold text-creek-900">Feasibility checks</h3>
        <PlanChecks units={units} checks={plan.checks} emptyText="No check found a problem with this site." />
      </div>
    </div>
  );
}

function SurgeCompare({ plan, units }: { plan: RamPlanResult; units: UnitSystem }) {
  const { surge } = plan;
  const rating = surge.deliveryRatingHeadM;
  const over = rating !== null && surge.peakHeadAtPumpM > rating;
  return (
    <div className="space-y-2 rounded-md border border-creek-100 p-3 text-sm">
      <h3 className="font-semibold text-creek-900">Surge at the pump</h3>
      <p className="text-creek-800">
        Each beat stops the drive column: about {formatQuantity('head', surge.surgeHeadM, units)} of surge (a·v/g with a
        = {formatNumber(surge.waveSpeedMs, 0)} m/s and v = {formatQuantity('velocity', surge.driveVelocityMs, units)},
        the drive velocity when the waste valve shuts; the beat&apos;s mean is{' '}
        {formatQuantity('velocity', surge.meanDriveVelocityMs, units)}). The drive pipe loses{' '}
        {formatQuantity('head', surge.driveFrictionM, units)} of the fall to friction. Against a shut delivery line the
        pump can build about <strong className="tabular">{formatQuantity('head', surge.peakHeadAtPumpM, units)}</strong>
        {rating !== null ? (
          <>
            {' '}
            against a delivery pipe rated for{' '}
            <strong className="tabular">{formatQuantity('head', rating, units)}</strong>
            {over ? ': above its rating.' : '.'}
          </>
        ) : (
          <>; the delivery pipe rating is not known.</>
        )}
      </p>
      <p className="text-xs text-creek-600">Wave speed: {surge.waveSpeedSource}</p>
      <Caution text={plan.caution} />
    </div>
  );
}
