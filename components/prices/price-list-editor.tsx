'use client';

import { useQuery } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { PipePicker } from '@/components/lines/pipe-picker';
import { UnitNumberInput } from '@/components/lines/unit-number-input';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { LoadError } from '@/components/ui/load-error';
import { HeadCell, TableFrame } from '@/components/ui/table-frame';
import {
  draftRowsOf,
  newPriceRow,
  pipeLabelOf,
  priceListCandidate,
  type PriceRowDraft,
} from '@/lib/network/price-list-draft';
import { ApiError } from '@/lib/queries/fetch-json';
import { priceListQuery, useSavePriceList } from '@/lib/queries/price-list';
import { fieldErrorsOf } from '@/lib/validations/common';
import { PriceListSchema } from '@/lib/validations/network';
import { TableSkeleton } from '@/components/ui/widget-skeletons';

type Errors = Record<string, string[]>;

/** The team's price list: one row per priced pipe, edited in place and saved whole. */
export function PriceListEditor({ teamId, canEdit }: { teamId: string; canEdit: boolean }) {
  const { data, error, refetch } = useQuery(priceListQuery(teamId));
  if (error) return <LoadError what="The price list" onRetry={() => void refetch()} />;
  if (!data) return <PriceListSkeleton />;
  return <PriceTable teamId={teamId} initial={draftRowsOf(data)} canEdit={canEdit} />;
}

function PriceTable({ teamId, initial, canEdit }: { teamId: string; initial: PriceRowDraft[]; canEdit: boolean }) {
  const save = useSavePriceList(teamId);
  const [rows, setRows] = useState(initial);
  const [errors, setErrors] = useState<Errors>({});
  const [done, setDone] = useState<string | null>(null);
  const added = useRef(0);
  const change = (key: string, patch: Partial<PriceRowDraft>) => {
    setDone(null);
    setRows((current) => current.map((row) => (row.key === key ? { ...row, ...patch } : row)));
  };

  function submit() {
    const parsed = PriceListSchema.safeParse(priceListCandidate(rows));
    if (!parsed.success) return setErrors(fieldErrorsOf(parsed.error));
    setErrors({});
    save.mutate(parsed.data, {
      onSuccess: (items) => {
        // The saved list, as the server keeps it (sorted), becomes the rows being edited.
        setRows(draftRowsOf(items));
        setDone(`Saved ${items.length} priced ${items.length === 1 ? 'pipe' : 'pipes'}`);
      },
      onError: (error) => setErrors(error instanceof ApiError && error.fields ? error.fields : {}),
    });
  }

  const fieldError = (index: number, field: string) => errors[`items.${index}.${field}`];
  return (
    <div className="space-y-3">
      <TableFrame
        head={
          <>
            <HeadCell>Pipe</HeadCell>
            <HeadCell>Cost per metre</HeadCell>
            <HeadCell>Notes</HeadCell>
            {canEdit && (
              <HeadCell>
                <span className="sr-only">Remove</span>
              </HeadCell>
            )}
          </>
        }
      >
        {rows.map((row, index) => (
          <tr
            key={row.key}
            className="border-t border-creek-50 align-top"
            aria-label={`Price of ${pipeLabelOf(row.pipeId)}`}
          >
            <td className="px-4 py-2">
              {canEdit ? (
                <PipePicker
                  id={`price-${row.key}-pipe`}
                  pipeId={row.pipeId}
                  custom={[]}
                  disabled={false}
                  onPick={(pipeId) => change(row.key, { pipeId })}
                />
              ) : (
                pipeLabelOf(row.pipeId)
              )}
              {fieldError(index, 'pipeId') && (
                <p role="alert" className="mt-0.5 text-xs font-medium text-clay-600">
                  {fieldError(index, 'pipeId')!.join(' ')}
                </p>
              )}
            </td>
            <td className="px-4 py-2">
              <UnitNumberInput
                id={`price-${row.key}-cost`}
                label={`Cost per metre of ${pipeLabelOf(row.pipeId)}`}
                unit="per m"
                compact
                digits={2}
                value={row.costPerM}
                disabled={!canEdit}
                optional
                errors={fieldError(index, 'costPerM')}
                onCommit={(value) => {
                  change(row.key, { costPerM: value });
                  return null;
                }}
              />
            </td>
            <td className="px-4 py-2">
              <input
                aria-label={`Notes on ${pipeLabelOf(row.pipeId)}`}
                value={row.notes}
                disabled={!canEdit}
                onChange={(e) => change(row.key, { notes: e.target.value })}
                className="block w-full rounded-md border border-creek-200 bg-white px-2 py-1 text-sm disabled:bg-creek-50"
              />
              {fieldError(index, 'notes') && (
                <p role="alert" className="mt-0.5 text-xs font-medium text-clay-600">
                  {fieldError(index, 'notes')!.join(' ')}
                </p>
              )}
            </td>
            {canEdit && (
              <td className="px-4 py-2">
                <button
                  type="button"
                  className="text-xs text-clay-700 underline"
                  onClick={() => {
                    setDone(null);
                    setRows((current) => current.filter((r) => r.key !== row.key));
                  }}
                >
                  Remove
                </button>
              </td>
            )}
          </tr>
        ))}
      </TableFrame>
      {rows.length === 0 && <p className="text-sm text-creek-700">No pipe is priced yet: sizing needs at least one.</p>}
      {errors.items && <FormMessage message={errors.items.join(' ')} />}
      {canEdit && (
        <div className="flex flex-wrap items-center gap-3">
          <Button
            tone="quiet"
            onClick={() => {
              setDone(null);
              added.current += 1;
              const serial = added.current;
              setRows((current) => [...current, newPriceRow(current, serial)]);
            }}
          >
            Add a pipe
          </Button>
          <Button onClick={submit} disabled={save.isPending}>
            Save the price list
          </Button>
          <FormMessage
            message={save.error && !Object.keys(errors).length ? save.error.message : done}
            tone={save.error && !done ? 'error' : 'ok'}
          />
        </div>
      )}
    </div>
  );
}

export function PriceListSkeleton() {
  return <TableSkeleton label="Loading the price list" rows={6} />;
}
