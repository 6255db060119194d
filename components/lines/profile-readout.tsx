'use client';

import type { ProfileChartData } from '@/lib/chart/profile-types';
import type { DisplayUnits } from '@/lib/units/display';
import { formatChainage, formatHeadPressure, formatLength, formatVelocity } from '@/lib/units/format';

/** Values at the point under the pointer, in the project's units (head and pressure together). */
export function ProfileReadout({ data, index, units }: { data: ProfileChartData; index: number | null; units: DisplayUnits }) {
  if (index === null) {
    return <p className="h-12 text-sm text-creek-600" aria-live="polite">Point at the profile or the plan to read the values there.</p>;
  }
  const p = data.points;
  const t = data.settings.waterTemperatureC;
  const stretch = data.stretches[p.stretchIndex[index]];
  const items: [string, string][] = [
    ['Chainage', formatChainage(p.chainageM[index], units)],
    ['Ground', formatLength(p.groundElevationM[index], units, 2)],
    ['Pipe', formatLength(p.pipeElevationM[index], units, 2)],
    ['Hydraulic grade', formatLength(p.hydraulicGradeM[index], units, 2)],
    ['Static head', formatLength(p.staticHeadM[index], units, 2)],
    ['Static pressure', formatHeadPressure(p.staticPressureHeadM[index], units, t)],
    ['Flowing pressure', formatHeadPressure(p.pressureHeadM[index], units, t)],
    ['Velocity', formatVelocity(p.velocityMs[index], units)],
    ['Pipe here', stretch?.pipe.label ?? '—'],
  ];
  return (
    <dl className="grid min-h-12 grid-cols-2 gap-x-4 gap-y-0.5 text-xs sm:grid-cols-3 lg:grid-cols-5" aria-live="polite" data-testid="profile-readout">
      {items.map(([k, v]) => (
        <div key={k} className="flex gap-1.5">
          <dt className="text-creek-600">{k}</dt>
          <dd className="tabular font-medium text-creek-900">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
