'use client';

import { DEFAULT_LINE_SETTINGS, type LineSettings } from '@/hydraulics/index';
import { formatQuantity, formatTemperature, fromDisplay, toDisplay, unitOf, type DisplayUnits } from '@/lib/units';
import type { LineDesign } from '@/lib/validations/line-design';
import { UnitNumberInput } from './unit-number-input';

type Change = (next: LineDesign, label: string) => string | null;
type NumberKey = Exclude<keyof LineSettings, 'frictionMethod' | 'checkSurge' | 'heightScatterM' | 'heightDatum'>;

/**
 * Analysis settings; an empty field falls back to the core's default (shown as the hint). When the
 * route's heights are on an assumed datum, the site altitude is asked for: the highest ground of a
 * level book started at 100 m is no altitude (profile-and-checks.md §6).
 */
export function SettingsForm({
  design,
  units,
  change,
  canEdit,
  assumedDatum = false,
}: {
  design: LineDesign;
  units: DisplayUnits;
  change: Change;
  canEdit: boolean;
  assumedDatum?: boolean;
}) {
  const s = design.settings;
  const set = (patch: Partial<LineSettings>, label: string) => {
    const settings: LineSettings = { ...s, ...patch };
    for (const k of Object.keys(patch) as (keyof LineSettings)[]) if (patch[k] === undefined) delete settings[k];
    return change({ ...design, settings }, label);
  };
  const field = (
    key: NumberKey,
    label: string,
    unit: string,
    toUnit: (si: number) => number,
    fromUnit: (v: number) => number,
    fallback: string,
  ) => (
    <UnitNumberInput
      id={`setting-${key}`}
      label={label}
      unit={unit}
      optional
      disabled={!canEdit}
      value={s[key] === undefined ? undefined : toUnit(s[key] as number)}
      hint={`Empty: ${fallback}`}
      onCommit={(v) => set({ [key]: v === undefined ? undefined : fromUnit(v) }, `change ${label.toLowerCase()}`)}
    />
  );
  const L = [
    (m: number) => toDisplay('length', m, units.system),
    (v: number) => fromDisplay('length', v, units.system),
  ] as const;
  const V = [
    (m: number) => toDisplay('velocity', m, units.system),
    (v: number) => fromDisplay('velocity', v, units.system),
  ] as const;
  const H = [
    (m: number) => toDisplay('head', m, units.system),
    (v: number) => fromDisplay('head', v, units.system),
  ] as const;
  const T = [
    (c: number) => toDisplay('temperature', c, units.system),
    (v: number) => fromDisplay('temperature', v, units.system),
  ] as const;
  const same = [(v: number) => v, (v: number) => v] as const;
  const d = DEFAULT_LINE_SETTINGS;
  const inUnits = (m: number, conv: readonly [(m: number) => number, unknown], unit: string) =>
    `${Number(conv[0](m).toFixed(2))} ${unit}`;

  const askAltitude = assumedDatum && s.siteAltitudeM === undefined;
  return (
    <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
      {askAltitude && (
        <p
          role="note"
          data-testid="ask-site-altitude"
          className="rounded-md border border-ochre-100 bg-ochre-50 px-3 py-2 text-sm text-ochre-700 sm:col-span-2 lg:col-span-4"
        >
          The heights of this route are on an assumed datum (a level book, hose level or typed heights), so they say
          nothing about the site&apos;s altitude. Enter the altitude above sea level (from a map or a phone) under Site
          altitude: the siphon and vapour limits depend on it.
        </p>
      )}
      <div>
        <label htmlFor="setting-frictionMethod" className="block text-xs font-medium text-creek-900">
          Friction method
        </label>
        <select
          id="setting-frictionMethod"
          disabled={!canEdit}
          value={s.frictionMethod ?? d.frictionMethod}
          onChange={(e) =>
            set({ frictionMethod: e.target.value as LineSettings['frictionMethod'] }, 'change the friction method')
          }
          className="mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1 text-sm disabled:bg-creek-50"
        >
          <option value="hazen-williams">Hazen-Williams</option>
          <option value="darcy-weisbach">Darcy-Weisbach (Colebrook)</option>
        </select>
      </div>
      {field(
        'waterTemperatureC',
        'Water temperature',
        unitOf('temperature', units.system),
        ...T,
        formatTemperature(d.waterTemperatureC, units.system),
      )}
      {field('safetyFactor', 'Safety factor on ratings', '×', ...same, `${d.safetyFactor}`)}
      {field('defaultCoverM', 'Pipe cover', units.length, ...L, formatQuantity('depth', d.defaultCoverM, units.system))}
      {field('velocityMinMs', 'Lowest velocity', units.velocity, ...V, inUnits(d.velocityMinMs, V, units.velocity))}
      {field('velocityMaxMs', 'Highest velocity', units.velocity, ...V, inUnits(d.velocityMaxMs, V, units.velocity))}
      {field(
        'minResidualHeadM',
        'Minimum residual at outlets',
        units.head,
        ...H,
        inUnits(d.minResidualHeadM, H, units.head),
      )}
      {field(
        'siphonLimitHeadM',
        'Siphon limit',
        units.head,
        ...H,
        `${inUnits(d.siphonLimitHeadM, H, units.head)} at sea level, scaled to the site's air pressure`,
      )}
      {field(
        'airPointToleranceM',
        'High/low point tolerance',
        units.length,
        ...L,
        inUnits(d.airPointToleranceM, L, units.length),
      )}
      {field(
        'siteAltitudeM',
        'Site altitude',
        units.length,
        ...L,
        assumedDatum ? "highest ground in the route's own datum (a guess: enter it)" : 'highest ground of the line',
      )}
      {field(
        'entranceLossK',
        'Entrance loss K at tanks',
        'K',
        ...same,
        `${d.entranceLossK} (sharp-edged), plus the velocity head`,
      )}
      <label className="flex items-center gap-2 self-center text-sm text-creek-900">
        <input
          type="checkbox"
          disabled={!canEdit}
          checked={s.checkSurge ?? d.checkSurge}
          onChange={(e) => set({ checkSurge: e.target.checked }, 'switch the surge check')}
        />
        Check sudden-stop surge
      </label>
    </div>
  );
}
