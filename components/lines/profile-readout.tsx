'use client';

import type { ProfileChartData } from '@/lib/chart/profile-types';
import { formatHeadPressure, formatQuantity, type DisplayUnits } from '@/lib/units';

/** Values at the point under the pointer, in the project's units (head and pressure together). */
export function ProfileReadout({
  data,
  index,
  units,
}: {
  data: ProfileChartData;
  index: number | null;
  units: DisplayUnits;
}) {
  if (index === null) {
    return (
      <p className="h-12 text-sm text-creek-600" aria-live="polite">
        Point at the profile or the plan to read the values there.
      </p>
    );
  }
  const p = data.points;
  const t = data.settings.waterTemperatureC;
  const stretch = data.stretches[p.stretchIndex[index]];
  const items: [string, string][] = [
    ['Chainage', formatQuantity('chainage', p.chainageM[index], units.system)],
    ['Ground', formatQuantity('elevation', p.groundElevationM[index], units.system)],
    ['Pipe', formatQuantity('elevation', p.pipeElevationM[index], units.system)],
    ['Hydraulic grade', formatQuantity('elevation', p.hydraulicGradeM[index], units.system)],
    ['Static head', formatQuantity('elevation', p.staticHeadM[index], units.system)],
    ['Static pressure', formatHeadPressure(p.staticPressureHeadM[index], units.system, t)],
    ['Flowing pressure', formatHeadPressure(p.pressureHeadM[index], units.system, t)],
    ['Velocity', formatQuantity('velocity', p.velocityMs[index], units.system)],
    ['Pipe here', stretch?.pipe.label ?? '—'],
  ];
  return (
    <dl
      className="grid min-h-12 grid-cols-2 gap-x-4 gap-y-0.5 text-xs sm:grid-cols-3 lg:grid-cols-5"
      aria-live="polite"
      data-testid="profile-readout"
    >
      {items.map(([k, v]) => (
        <div key={k} className="flex gap-1.5">
          <dt className="text-creek-600">{k}</dt>
          <dd className="tabular font-medium text-creek-900">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
