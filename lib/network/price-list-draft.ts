import { findPipe, PIPE_CATALOGUE } from '../../hydraulics/index';
import type { PriceListItemRecord } from '../data/price-list';
import type { PriceListInput } from '../validations/network';

/** A row of the price list being edited: the cost is undefined until one is typed. */
export interface PriceRowDraft {
  key: string;
  pipeId: string;
  costPerM: number | undefined;
  notes: string;
}

/**
 * Row keys become element ids, so they must come out the same on the server and in the browser:
 * a saved row is keyed by its place in the saved list, a new row by a number the table counts itself.
 * (A module-wide counter differs between the two and once gave a new row the id of the first.)
 */
export function draftRowsOf(items: readonly PriceListItemRecord[]): PriceRowDraft[] {
  return items.map((item, index) => ({
    key: `saved-${index}`,
    pipeId: item.pipeId,
    costPerM: item.costPerM,
    notes: item.notes,
  }));
}

/** A new row for the first catalogue pipe not priced yet (a designer then picks the one they mean). */
export function newPriceRow(rows: readonly PriceRowDraft[], serial: number): PriceRowDraft {
  const priced = new Set(rows.map((row) => row.pipeId));
  const pipe = PIPE_CATALOGUE.find((p) => !priced.has(p.id)) ?? PIPE_CATALOGUE[0];
  return { key: `new-${serial}`, pipeId: pipe.id, costPerM: undefined, notes: '' };
}

/** What the API takes (a cost not typed stays out, so the schema names that row's field). */
export function priceListCandidate(rows: readonly PriceRowDraft[]): {
  items: Partial<PriceListInput['items'][number]>[];
} {
  return {
    items: rows.map((row) => ({
      pipeId: row.pipeId,
      ...(row.costPerM === undefined ? {} : { costPerM: row.costPerM }),
      notes: row.notes,
    })),
  };
}

export const pipeLabelOf = (pipeId: string) => findPipe(pipeId)?.label ?? pipeId;
