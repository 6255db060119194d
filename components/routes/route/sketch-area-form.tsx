'use client';

import { fromDisplay, toDisplay, unitOf } from '@/lib/units';
import type { UnitSystem } from '@/lib/units';
import { typedNumber } from '@/lib/units/decimal-mark-store';

export interface SketchArea {
  lengthM: number;
  lowM: number;
  highM: number;
}

/** The size of the empty chart a route is sketched on, in the project's units. */
export function SketchAreaForm({
  area,
  units,
  onChange,
}: {
  area: SketchArea;
  units: UnitSystem;
  onChange: (a: SketchArea) => void;
}) {
  const u = unitOf('length', units);
  const set = (key: keyof SketchArea, text: string) => {
    const v = typedNumber(text);
    if (text.trim() !== '' && Number.isFinite(v)) onChange({ ...area, [key]: fromDisplay('length', v, units) });
  };
  const box = 'mt-1 block w-24 rounded-md border border-creek-200 px-2 py-1';
  return (
    <div className="flex flex-wrap items-end gap-3 text-sm" role="group" aria-label="Sketch area">
      <label>
        Chart length ({u})
        <input
          defaultValue={toDisplay('length', area.lengthM, units).toFixed(0)}
          onBlur={(e) => set('lengthM', e.target.value)}
          className={box}
        />
      </label>
      <label>
        Heights from ({u})
        <input
          defaultValue={toDisplay('length', area.lowM, units).toFixed(0)}
          onBlur={(e) => set('lowM', e.target.value)}
          className={box}
        />
      </label>
      <label>
        to ({u})
        <input
          defaultValue={toDisplay('length', area.highM, units).toFixed(0)}
          onBlur={(e) => set('highM', e.target.value)}
          className={box}
        />
      </label>
    </div>
  );
}
