'use client';

import { HEIGHT_SOURCES, type HeightSource } from '@/hydraulics/index';
import { removeKeepingFocus } from '@/components/ui/focus-return';
import { formatNumber, fromDisplay, toDisplay, unitDef } from '@/lib/units';
import type { DraftAction, DraftPoint } from '@/lib/routes/draft';
import type { UnitSystem } from '@/lib/units';
import { HEIGHT_SOURCE_LABELS } from '../format-labels';
import { NumberCell } from './number-cell';

export interface PointRowProps {
  point: DraftPoint;
  /** Place of the row along the route (0-based) and the route's point count. */
  index: number;
  count: number;
  /** First or last row of the page: a point moves only within the page being edited. */
  firstOnPage?: boolean;
  lastOnPage?: boolean;
  units: UnitSystem;
  editable: boolean;
  positioned: boolean;
  hasProposal: boolean;
  dispatch: (action: DraftAction) => void;
}

const show = (m: number | null, units: UnitSystem) => (m === null ? null : toDisplay('length', m, units));

/** One station in the points table: read-only for readers, edit controls for surveyors. */
export function PointRow({
  point: p,
  index,
  count,
  firstOnPage = false,
  lastOnPage = false,
  units,
  editable,
  positioned,
  hasProposal,
  dispatch,
}: PointRowProps) {
  const n = index + 1;
  const changed = p.rawElevationM !== null && Math.abs(p.rawElevationM - p.elevationM) > 0.005;
  const edit = (patch: Extract<DraftAction, { type: 'edit' }>['patch']) =>
    dispatch({ type: 'edit', key: p.key, patch });
  const toM = (v: number | null) => (v === null ? null : fromDisplay('length', v, units));
  return (
    <tr
      className={`border-t border-creek-50 ${p.excluded ? 'text-creek-400 line-through' : ''} ${hasProposal ? 'bg-clay-50/60' : ''}`}
      data-point={n}
    >
      <td className="tabular px-2 py-1 text-creek-600">{n}</td>
      <td className="tabular px-2 py-1 text-right">
        {editable && !positioned ? (
          <NumberCell
            label={`Chainage of point ${n}`}
            value={show(p.chainageM, units)}
            digits={2}
            onCommit={(v) => edit({ chainageM: toM(v) })}
          />
        ) : p.chainageM === null ? (
          '—'
        ) : (
          formatNumber(toDisplay('chainage', p.chainageM, units), unitDef('chainage', units).decimals)
        )}
      </td>
      <td className="tabular px-2 py-1 text-right">
        {editable ? (
          <NumberCell
            label={`Elevation of point ${n}`}
            value={show(p.elevationM, units)}
            digits={2}
            onCommit={(v) => v !== null && edit({ elevationM: fromDisplay('length', v, units) })}
          />
        ) : (
          <span className={changed ? 'font-semibold text-moss-700' : undefined}>
            {formatNumber(toDisplay('elevation', p.elevationM, units), unitDef('elevation', units).decimals)}
          </span>
        )}
      </td>
      <td className={`tabular px-2 py-1 text-right ${changed ? 'text-ochre-700' : 'text-creek-500'}`}>
        {p.rawElevationM === null
          ? 'new'
          : formatNumber(toDisplay('elevation', p.rawElevationM, units), unitDef('elevation', units).decimals)}
      </td>
      <td className="px-2 py-1">
        {editable ? (
          <input
            aria-label={`Label of point ${n}`}
            defaultValue={p.label ?? ''}
            key={`${p.key}-${p.label}`}
            onBlur={(e) => e.target.value !== (p.label ?? '') && edit({ label: e.target.value || null })}
            className="w-36 rounded border border-creek-100 px-1.5 py-0.5 text-sm"
          />
        ) : (
          (p.label ?? '')
        )}
      </td>
      <td className="px-2 py-1 text-xs">
        {editable ? (
          <select
            aria-label={`Height source of point ${n}`}
            value={p.heightSource}
            onChange={(e) => edit({ heightSource: e.target.value as HeightSource })}
            className="rounded border border-creek-100 px-1 py-0.5"
          >
            {HEIGHT_SOURCES.map((s) => (
              <option key={s} value={s}>
                {HEIGHT_SOURCE_LABELS[s]}
              </option>
            ))}
          </select>
        ) : (
          HEIGHT_SOURCE_LABELS[p.heightSource]
        )}
      </td>
      <td className="tabular px-2 py-1 text-xs text-creek-600">
        {p.latitude === null ? '—' : `${p.latitude.toFixed(6)}, ${p.longitude?.toFixed(6)}`}
      </td>
      <td className="px-2 py-1 text-xs">
        {editable ? (
          <label className="flex items-center gap-1 no-underline">
            <input
              type="checkbox"
              checked={!p.excluded}
              onChange={(e) => edit({ excluded: !e.target.checked })}
              aria-label={`Use point ${n} in the cleaned profile`}
            />{' '}
            use
          </label>
        ) : p.excluded ? (
          'left out'
        ) : changed ? (
          'cleaned'
        ) : (
          ''
        )}
      </td>
      {editable && (
        <td className="whitespace-nowrap px-2 py-1 text-xs">
          <button
            type="button"
            aria-label={`Move point ${n} up`}
            disabled={index === 0 || firstOnPage}
            onClick={() => dispatch({ type: 'move', key: p.key, by: -1 })}
            className="px-1 disabled:opacity-30"
          >
            ↑
          </button>
          <button
            type="button"
            aria-label={`Move point ${n} down`}
            disabled={index === count - 1 || lastOnPage}
            onClick={() => dispatch({ type: 'move', key: p.key, by: 1 })}
            className="px-1 disabled:opacity-30"
          >
            ↓
          </button>
          <button
            type="button"
            aria-label={`Delete point ${n}`}
            onClick={(e) => removeKeepingFocus(e.currentTarget, () => dispatch({ type: 'delete', key: p.key }))}
            className="px-1 text-clay-600"
          >
            ✕
          </button>
        </td>
      )}
    </tr>
  );
}
