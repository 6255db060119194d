'use client';

import { formatNumber, unitOf } from '@/lib/units';
import type { DraftAction, DraftPoint } from '@/lib/routes/draft';
import type { UnitSystem } from '@/lib/units';
import { AddPointForm } from './add-point-form';
import { PointRow } from './point-row';
import { ScrollFrame } from '@/components/ui/table-frame';

export interface PointsTableProps {
  /** The page of rows, as edited. */
  points: readonly DraftPoint[];
  /** Place along the route (seq) of the page's first row. */
  offset: number;
  /** Points on the whole route, with this page's edits. */
  total: number;
  units: UnitSystem;
  editable: boolean;
  positioned: boolean;
  /** Source seqs with a pending clean-up proposal, highlighted. */
  flagged: ReadonlySet<number>;
  page: number;
  pageCount: number;
  onPage: (page: number) => void;
  /** Why the pages cannot be turned now (unsaved edits on this one), or null. */
  pagingBlocked: string | null;
  dispatch: (action: DraftAction) => void;
}

/** The route's stations, a page at a time as read from the server, with cleaned and surveyed heights side by side. */
export function PointsTable({
  points,
  offset,
  total,
  units,
  editable,
  positioned,
  flagged,
  page,
  pageCount,
  onPage,
  pagingBlocked,
  dispatch,
}: PointsTableProps) {
  const current = Math.min(page, pageCount - 1);
  const u = unitOf('length', units);
  return (
    <div className="space-y-3">
      <ScrollFrame label="Route points">
        <table className="w-full text-left text-sm" aria-label="Route points">
          <thead className="bg-creek-50 text-xs text-creek-800">
            <tr>
              <th scope="col" className="px-2 py-1.5">
                #
              </th>
              <th scope="col" className="px-2 py-1.5 text-right">
                Chainage ({u})
              </th>
              <th scope="col" className="px-2 py-1.5 text-right">
                Elevation ({u})
              </th>
              <th scope="col" className="px-2 py-1.5 text-right">
                As surveyed ({u})
              </th>
              <th scope="col" className="px-2 py-1.5">
                Label
              </th>
              <th scope="col" className="px-2 py-1.5">
                Height from
              </th>
              <th scope="col" className="px-2 py-1.5">
                Position
              </th>
              <th scope="col" className="px-2 py-1.5">
                {editable ? 'In profile' : 'State'}
              </th>
              {editable && (
                <th scope="col" className="px-2 py-1.5">
                  Order
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {points.map((p, i) => (
              <PointRow
                key={p.key}
                point={p}
                index={offset + i}
                count={total}
                firstOnPage={i === 0}
                lastOnPage={i === points.length - 1}
                units={units}
                editable={editable}
                positioned={positioned}
                hasProposal={p.sourceSeq !== null && flagged.has(p.sourceSeq)}
                dispatch={dispatch}
              />
            ))}
            {points.length === 0 && (
              <tr>
                <td colSpan={9} className="px-3 py-5 text-center text-creek-600">
                  No points yet.{editable ? ' Click on the profile to sketch, or add points below.' : ''}
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </ScrollFrame>
      {pageCount > 1 && (
        <nav aria-label="Pages of points" className="flex flex-wrap items-center gap-2 text-sm">
          <button
            type="button"
            onClick={() => onPage(current - 1)}
            disabled={current === 0 || pagingBlocked !== null}
            className="rounded border border-creek-200 px-2 py-0.5 disabled:opacity-40"
          >
            Previous
          </button>
          <span className="tabular">
            Points {formatNumber(offset + 1, 0)}–{formatNumber(offset + points.length, 0)} of {formatNumber(total, 0)}
          </span>
          <button
            type="button"
            onClick={() => onPage(current + 1)}
            disabled={current >= pageCount - 1 || pagingBlocked !== null}
            className="rounded border border-creek-200 px-2 py-0.5 disabled:opacity-40"
          >
            Next
          </button>
          {pagingBlocked && (
            <span className="text-xs text-ochre-700" role="status">
              {pagingBlocked}
            </span>
          )}
        </nav>
      )}
      {editable && (
        <AddPointForm offset={offset} count={points.length} units={units} positioned={positioned} dispatch={dispatch} />
      )}
    </div>
  );
}
