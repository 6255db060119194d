'use client';

import { useMemo, useState } from 'react';
import type { LineAnalysis } from '@/hydraulics/index';
import { downloadText } from '@/lib/lines/download';
import { reportFileName } from '@/lib/lines/file-names';
import {
  cellText,
  stationColumns,
  stationRows,
  stretchColumns,
  tableCsv,
  type ResultColumn,
} from '@/lib/lines/results-table';
import type { DisplayUnits } from '@/lib/units';
import { Button } from '@/components/ui/button';
import { ScrollFrame } from '@/components/ui/table-frame';

const PAGE_ROWS = 50;

function Table<R>({
  caption,
  columns,
  rows,
  rowKey,
  onRowHover,
}: {
  caption: string;
  columns: ResultColumn<R>[];
  rows: readonly R[];
  rowKey: (r: R, i: number) => string;
  onRowHover?: (r: R | null) => void;
}) {
  return (
    <ScrollFrame label={caption} dense>
      <table className="w-full text-right text-xs">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-creek-50 text-creek-800">
          <tr>
            {columns.map((c) => (
              <th key={c.key} scope="col" className="whitespace-nowrap px-2 py-1.5 font-medium">
                {c.heading}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr
              key={rowKey(r, i)}
              className="tabular border-t border-creek-50 hover:bg-creek-50/60"
              onMouseEnter={() => onRowHover?.(r)}
              onMouseLeave={() => onRowHover?.(null)}
            >
              {columns.map((c) => (
                <td key={c.key} className="whitespace-nowrap px-2 py-1">
                  {cellText(c, r)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollFrame>
  );
}

/** Results per station and per stretch: the accessible reading of the chart, with CSV files. */
export function ResultsTables({
  analysis,
  units,
  lineName,
  onHover,
}: {
  analysis: LineAnalysis;
  units: DisplayUnits;
  lineName: string;
  onHover: (chainageM: number | null) => void;
}) {
  const t = analysis.settings.waterTemperatureC;
  const [page, setPage] = useState(0);
  const stations = useMemo(() => stationRows(analysis), [analysis]);
  const sCols = useMemo(() => stationColumns(units, t), [units, t]);
  const rCols = useMemo(() => stretchColumns(units, t), [units, t]);
  const pages = Math.max(Math.ceil(stations.length / PAGE_ROWS), 1);
  const current = Math.min(page, pages - 1);
  const shown = stations.slice(current * PAGE_ROWS, (current + 1) * PAGE_ROWS);

  return (
    <div className="space-y-4">
      <div className="space-y-2">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h3 className="text-sm font-semibold text-creek-900">Per stretch</h3>
          <Button
            tone="quiet"
            className="py-1 text-xs"
            onClick={() =>
              downloadText(
                tableCsv(rCols, analysis.stretches),
                reportFileName(lineName, null, 'csv', 'stretches'),
                'text/csv',
              )
            }
          >
            Download stretches CSV
          </Button>
        </div>
        <Table
          caption="Results per stretch"
          columns={rCols}
          rows={analysis.stretches}
          rowKey={(s) => String(s.index)}
        />
      </div>
      <div className="space-y-2">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h3 className="text-sm font-semibold text-creek-900">
            Per station ({stations.length} points, stations and inserted points)
          </h3>
          <Button
            tone="quiet"
            className="py-1 text-xs"
            onClick={() =>
              downloadText(tableCsv(sCols, stations), reportFileName(lineName, null, 'csv', 'stations'), 'text/csv')
            }
            data-testid="stations-csv"
          >
            Download stations CSV
          </Button>
        </div>
        <Table
          caption="Results per station"
          columns={sCols}
          rows={shown}
          rowKey={(r, i) => `${r.chainageM}-${i}`}
          onRowHover={(r) => onHover(r ? r.chainageM : null)}
        />
        {pages > 1 && (
          <nav aria-label="Station table pages" className="flex items-center gap-2 text-xs">
            <Button
              tone="quiet"
              className="px-2 py-1 text-xs"
              disabled={current === 0}
              onClick={() => setPage(current - 1)}
            >
              Previous
            </Button>
            <span>
              Page {current + 1} of {pages}
            </span>
            <Button
              tone="quiet"
              className="px-2 py-1 text-xs"
              disabled={current >= pages - 1}
              onClick={() => setPage(current + 1)}
            >
              Next
            </Button>
          </nav>
        )}
      </div>
    </div>
  );
}
