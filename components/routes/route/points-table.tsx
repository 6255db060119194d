'use client';

import { formatNumber, unitOf } from '@/lib/units';
import type { DraftAction, DraftPoint } from '@/lib/routes/draft';
import type { UnitSystem } from '@/lib/units';
import { AddPointForm } from './add-point-form';
import { PointRow } from './point-row';
import { ScrollFrame } from '@/components/ui/table-frame';

export const PAGE_SIZE = 50;

export interface PointsTableProps {
  points: readonly DraftPoint[];
  units: UnitSystem;
  editable: boolean;
  positioned: boolean;
  /** Source seqs with a pending clean-up proposal, highlighted. */
  flagged: ReadonlySet<number>;
  page: number;
  onPage: (page: number) => void;
  dispatch: (action: DraftAction) => void;
}

/** The route's stations, a page at a time, with cleaned and surveyed heights side by side. */
export function PointsTable({ points, units, editable, positioned, flagged, page, onPage, dispatch }: PointsTableProps) {
  const pages = Math.max(1, Math.ceil(points.length / PAGE_SIZE));
  const current = Math.min(page, pages - 1);
  const start = current * PAGE_SIZE;
  const u = unitOf('length', units);
  return (
    <div className="space-y-3">
      <ScrollFrame label="Route points">
        <table className="w-full text-left text-sm" aria-label="Route points">
          <thead className="bg-creek-50 text-xs text-creek-800">
            <tr>
              <th scope="col" className="px-2 py-1.5">#</th>
              <th scope="col" className="px-2 py-1.5 text-right">Chainage ({u})</th>
              <th scope="col" className="px-2 py-1.5 text-right">Elevation ({u})</th>
              <th scope="col" className="px-2 py-1.5 text-right">As surveyed ({u})</th>
              <th scope="col" className="px-2 py-1.5">Label</th>
              <th scope="col" className="px-2 py-1.5">Height from</th>
              <th scope="col" className="px-2 py-1.5">Position</th>
              <th scope="col" className="px-2 py-1.5">{editable ? 'In profile' : 'State'}</th>
              {editable && <th scope="col" className="px-2 py-1.5">Order</th>}
            </tr>
          </thead>
          <tbody>
            {points.slice(start, start + PAGE_SIZE).map((p, i) => (
              <PointRow
                key={p.key}
                point={p}
                index={start + i}
                count={points.length}
                units={units}
                editable={editable}
                positioned={positioned}
                hasProposal={p.sourceSeq !== null && flagged.has(p.sourceSeq)}
                dispatch={dispatch}
              />
            ))}
            {points.length === 0 && (
              <tr><td colSpan={9} className="px-3 py-5 text-center text-creek-600">No points yet.{editable ? ' Click on the profile to sketch, or add points below.' : ''}</td></tr>
            )}
          </tbody>
        </table>
      </ScrollFrame>
      {pages > 1 && (
        <nav aria-label="Pages of points" className="flex items-center gap-2 text-sm">
          <button type="button" onClick={() => onPage(current - 1)} disabled={current === 0} className="rounded border border-creek-200 px-2 py-0.5 disabled:opacity-40">Previous</button>
          <span className="tabular">Points {start + 1}–{Math.min(points.length, start + PAGE_SIZE)} of {formatNumber(points.length, 0)}</span>
          <button type="button" onClick={() => onPage(current + 1)} disabled={current >= pages - 1} className="rounded border border-creek-200 px-2 py-0.5 disabled:opacity-40">Next</button>
        </nav>
      )}
      {editable && <AddPointForm count={points.length} units={units} positioned={positioned} dispatch={dispatch} />}
    </div>
  );
}
