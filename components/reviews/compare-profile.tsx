'use client';

import { useMemo, useState } from 'react';
import type { ChainageView } from '@/lib/chart/profile-view';
import { analyseSnapshotLine } from '@/lib/review/snapshot-analysis';
import type { SnapshotLine } from '@/lib/review/snapshot-types';
import { displayUnits, type UnitSystem } from '@/lib/units';
import { ProfileChart } from '@/components/lines/profile-chart';

/** The later revision's long profile with the earlier revision's grade line dashed beside it. */
export function CompareProfile({
  before,
  after,
  system,
  beforeLabel,
}: {
  before: SnapshotLine | null;
  after: SnapshotLine;
  system: UnitSystem;
  beforeLabel: string;
}) {
  const units = useMemo(() => displayUnits(system), [system]);
  const now = useMemo(() => analyseSnapshotLine(after), [after]);
  const then = useMemo(() => (before ? analyseSnapshotLine(before) : null), [before]);
  const earlierGrade = useMemo(
    () => (then ? { label: beforeLabel, chainageM: then.points.chainageM, gradeM: then.points.hydraulicGradeM } : null),
    [then, beforeLabel],
  );
  const [view, setView] = useState<ChainageView | null>(null);
  const [hoverM, setHoverM] = useState<number | null>(null);
  if (!now) return <p className="text-sm text-clay-700">This line could not be analysed as frozen.</p>;
  const c = now.points.chainageM;
  return (
    <div>
      <ProfileChart
        data={now}
        devices={after.design.devices}
        units={units}
        view={view ?? { fromM: c[0], toM: c[c.length - 1] }}
        onViewChange={setView}
        exaggeration="auto"
        highlight={null}
        hoverM={hoverM}
        onHover={setHoverM}
        earlierGrade={earlierGrade}
      />
      <p className="mt-1 text-xs text-creek-700">Dashed ochre: the hydraulic grade line of {beforeLabel}.</p>
    </div>
  );
}
