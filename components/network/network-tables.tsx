'use client';

import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type ColumnDef } from '@tanstack/react-table';
import { useCallback, useMemo } from 'react';

// Mixed accessor and display columns: TanStack Table types such a list with `any` values.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Columns<T> = ColumnDef<T, any>[];
import { useConfirm } from '@/components/ui/confirm-dialog';
import { TableFrame } from '@/components/ui/table-frame';
import type { NetworkLinkRecord, NetworkNodeRecord } from '@/lib/network/records';
import { nodeRemoval } from '@/lib/network/removal';
import type { LinkResult, NodeResult, SolveRunResult } from '@/lib/network/run-result';
import type { NetworkView } from '@/lib/network/view';
import { useDeleteNetworkLink, useDeleteNetworkNode } from '@/lib/queries/network';
import { formatQuantity, type UnitSystem } from '@/lib/units';

const KIND_WORDS: Record<string, string> = {
  source: 'Source',
  'ram-outlet': 'Ram outlet',
  tank: 'Tank',
  'break-pressure-tank': 'Break-pressure tank',
  junction: 'Take-off',
  outlet: 'Outlet',
  line: 'Line',
  pipe: 'Pipe',
  valve: 'Valve',
};

const listWords = new Intl.ListFormat('en', { type: 'conjunction' });

function RemoveButton({ name, onClick }: { name: string; onClick: () => void }) {
  return (
    <button
      type="button"
      aria-label={`Remove ${name}`}
      className="text-xs text-clay-700 underline"
      onClick={(e) => {
        e.stopPropagation();
        onClick();
      }}
    >
      Remove
    </button>
  );
}

interface TableProps {
  view: NetworkView;
  solve: SolveRunResult | null;
  units: UnitSystem;
  selectedId: string | null;
  onSelect: (id: string) => void;
  projectId: string;
  canEdit: boolean;
}

function Grid<T extends { id: string }>({
  rows,
  columns,
  selectedId,
  onSelect,
  label,
}: {
  rows: T[];
  columns: Columns<T>;
  selectedId: string | null;
  onSelect: (id: string) => void;
  label: string;
}) {
  // The table is rebuilt from `rows` each render, so nothing stale is memoized.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel(), getRowId: (row) => row.id });
  return (
    <TableFrame
      head={table.getHeaderGroups()[0].headers.map((header) => (
        <th key={header.id} scope="col" className="px-3 py-2 font-medium">
          {flexRender(header.column.columnDef.header, header.getContext())}
        </th>
      ))}
    >
      {table.getRowModel().rows.map((row) => (
        <tr
          key={row.id}
          aria-label={`${label} ${(row.original as unknown as { name: string }).name}`}
          aria-selected={selectedId === row.id}
          onClick={() => onSelect(row.id)}
          className={`cursor-pointer border-t border-creek-50 ${selectedId === row.id ? 'bg-ochre-50' : 'hover:bg-creek-50'}`}
        >
          {row.getVisibleCells().map((cell) => (
            <td key={cell.id} className="px-3 py-1.5 align-top tabular">
              {flexRender(cell.column.columnDef.cell, cell.getContext())}
            </td>
          ))}
        </tr>
      ))}
    </TableFrame>
  );
}

type NodeRow = NetworkNodeRecord & { result: NodeResult | undefined };
type LinkRow = NetworkLinkRecord & { result: LinkResult | undefined; fromName: string; toName: string };

export function NodeTable({ view, solve, units, selectedId, onSelect, projectId, canEdit }: TableProps) {
  const remove = useDeleteNetworkNode(projectId);
  const confirm = useConfirm();
  const { ask } = confirm;
  const askRemove = useCallback(
    (nodeId: string) => {
      const removal = nodeRemoval(view, nodeId);
      ask({
        title: `Remove “${removal.name}”?`,
        body: (
          <>
            <p>
              “{removal.name}” goes from the network
              {removal.joins.length > 0 ? (
                <>
                  , and with it {removal.joins.length === 1 ? 'the join' : `its ${removal.joins.length} joins`}{' '}
                  {listWords.format(removal.joins.map((j) => `“${j}”`))}
                </>
              ) : (
                ''
              )}
              .
            </p>
            {removal.untiedUses.length > 0 && (
              <p>
                {listWords.format(removal.untiedUses.map((u) => `“${u}”`))}{' '}
                {removal.untiedUses.length === 1 ? 'stays' : 'stay'} on the Lift &amp; storage page, tied to no outlet.
              </p>
            )}
            <p>This cannot be undone.</p>
          </>
        ),
        confirmLabel: 'Remove part',
        onConfirm: () => remove.mutateAsync(nodeId),
      });
    },
    [view, ask, remove],
  );
  const lineEnds = useMemo(
    () => new Set(view.records.links.filter((l) => l.kind === 'line').flatMap((l) => [l.fromNodeId, l.toNodeId])),
    [view],
  );
  const columns = useMemo(() => {
    const c = createColumnHelper<NodeRow>();
    return [
      c.accessor('name', { header: 'Name' }),
      c.accessor('kind', { header: 'Kind', cell: (info) => KIND_WORDS[info.getValue()] }),
      c.display({
        id: 'elevation',
        header: 'Elevation',
        cell: ({ row }) => {
          const z = row.original.result?.elevationM ?? row.original.elevationM;
          return z === null || z === undefined ? '—' : formatQuantity('elevation', z, units);
        },
      }),
      c.display({
        id: 'demand',
        header: 'Draw at peak',
        cell: ({ row }) => {
          const d = row.original.result?.demandM3s;
          if (d === undefined || d === 0) return '—';
          return d < 0 ? `${formatQuantity('designFlow', -d, units)} in` : formatQuantity('designFlow', d, units);
        },
      }),
      c.display({
        id: 'pressure',
        header: 'Pressure head',
        cell: ({ row }) => {
          const r = row.original.result;
          if (!r || r.pressureHeadM === null) return '—';
          const short = r.minPressureHeadM !== null && r.pressureHeadM < r.minPressureHeadM - 1e-6;
          return (
            <span className={short ? 'font-semibold text-clay-700' : ''}>
              {formatQuantity('head', r.pressureHeadM, units)}
              {r.minPressureHeadM ? ` (wants ${formatQuantity('head', r.minPressureHeadM, units)})` : ''}
              {short ? ' short' : ''}
            </span>
          );
        },
      }),
      ...(canEdit
        ? [
            c.display({
              id: 'remove',
              header: '',
              cell: ({ row }) =>
                lineEnds.has(row.original.id) ? (
                  // An end of a line goes with its line (or once the line is joined elsewhere): the server refuses it.
                  <span className="text-xs text-creek-600">ends a line</span>
                ) : (
                  <RemoveButton name={row.original.name} onClick={() => askRemove(row.original.id)} />
                ),
            }),
          ]
        : []),
    ] as Columns<NodeRow>;
  }, [units, canEdit, askRemove, lineEnds]);
  const results = new Map((solve?.nodes ?? []).map((n) => [n.nodeId, n]));
  const rows = view.records.nodes.map((node) => ({ ...node, result: results.get(node.id) }));
  return (
    <>
      <Grid rows={rows} columns={columns} selectedId={selectedId} onSelect={onSelect} label="Node" />
      {confirm.dialog}
    </>
  );
}

export function LinkTable({ view, solve, units, selectedId, onSelect, projectId, canEdit }: TableProps) {
  const remove = useDeleteNetworkLink(projectId);
  const confirm = useConfirm();
  const { ask } = confirm;
  const askRemove = useCallback(
    (link: LinkRow) => {
      ask({
        title: `Remove “${link.name}”?`,
        body: (
          <>
            <p>
              The {link.kind === 'valve' ? 'valve' : 'join'} “{link.name}” from {link.fromName} to {link.toName} goes
              from the network; {link.fromName} and {link.toName} stay.
            </p>
            <p>This cannot be undone.</p>
          </>
        ),
        confirmLabel: link.kind === 'valve' ? 'Remove valve' : 'Remove join',
        onConfirm: () => remove.mutateAsync(link.id),
      });
    },
    [ask, remove],
  );
  const columns = useMemo(() => {
    const c = createColumnHelper<LinkRow>();
    return [
      c.accessor('name', { header: 'Name' }),
      c.accessor('kind', { header: 'Kind', cell: (info) => KIND_WORDS[info.getValue()] }),
      c.display({
        id: 'ends',
        header: 'From → to',
        cell: ({ row }) => `${row.original.fromName} → ${row.original.toName}`,
      }),
      c.display({
        id: 'pipe',
        header: 'Pipe',
        cell: ({ row }) => {
          const pieces = row.original.result?.pieces;
          if (!pieces)
            return typeof row.original.data.pipe === 'string'
              ? row.original.data.pipe
              : row.original.kind === 'line'
                ? 'as the line'
                : '—';
          return [...new Set(pieces.map((p) => p.pipeLabel))].join(' / ');
        },
      }),
      c.display({
        id: 'flow',
        header: 'Flow',
        cell: ({ row }) => {
          const result = row.original.result;
          if (!result) return '—';
          const flows = result.pieces.map((p) => formatQuantity('designFlow', p.flowM3s, units));
          return flows.length > 1 ? `${flows.join(' → ')}` : flows[0];
        },
      }),
      c.display({
        id: 'velocity',
        header: 'Velocity',
        cell: ({ row }) => {
          const pieces = row.original.result?.pieces;
          return pieces
            ? formatQuantity('velocity', Math.max(...pieces.map((p) => Math.abs(p.velocityMs))), units)
            : '—';
        },
      }),
      ...(canEdit
        ? [
            c.display({
              id: 'remove',
              header: '',
              cell: ({ row }) =>
                row.original.kind === 'line' ? null : (
                  <RemoveButton name={row.original.name} onClick={() => askRemove(row.original)} />
                ),
            }),
          ]
        : []),
    ] as Columns<LinkRow>;
  }, [units, canEdit, askRemove]);
  const names = new Map(view.records.nodes.map((n) => [n.id, n.name]));
  const results = new Map((solve?.links ?? []).map((l) => [l.linkId, l]));
  const rows = view.records.links.map((link) => ({
    ...link,
    result: results.get(link.id),
    fromName: names.get(link.fromNodeId) ?? '?',
    toName: names.get(link.toNodeId) ?? '?',
  }));
  return (
    <>
      <Grid rows={rows} columns={columns} selectedId={selectedId} onSelect={onSelect} label="Link" />
      {confirm.dialog}
    </>
  );
}
