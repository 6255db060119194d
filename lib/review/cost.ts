import { findPipe, type LineAnalysis } from '../../hydraulics/index';
import type { DesignSnapshot } from './snapshot-types';

/** One pipe of the design: how much of it is laid and what it costs at the frozen price. */
export interface PipeCostRow {
  pipeId: string;
  label: string;
  lengthM: number;
  /** Null when the price list in force had no price for this pipe. */
  costPerM: number | null;
  cost: number | null;
}

/** The pipe material cost of a revision at the price list it froze. */
export interface DesignCost {
  /** Sum of the priced rows (pipe lengths times the team's price per metre). */
  total: number;
  rows: PipeCostRow[];
  /** Pipe laid that the price list did not price, m (not in the total). */
  unpricedLengthM: number;
  /** Lines that could not be analysed as frozen, so their pipe is not counted. */
  uncountedLines: string[];
}

/**
 * Pipe material cost: every line's stretches by their slope length (the length friction is reckoned
 * on, and the length the network sizing prices), plus the network's own pipe links by their length,
 * each at the price per metre of the price list the revision froze. Null when the revision froze no
 * price list (it was made before prices were part of a revision).
 */
export function designCost(
  snapshot: DesignSnapshot,
  analyses: ReadonlyMap<string, LineAnalysis | null>,
): DesignCost | null {
  if (!snapshot.networkBasis) return null;
  const price = new Map(snapshot.networkBasis.prices.map((p) => [p.pipeId, p.costPerM]));
  const laid = new Map<string, { label: string; lengthM: number }>();
  const lay = (pipeId: string, label: string, lengthM: number) => {
    const row = laid.get(pipeId) ?? { label, lengthM: 0 };
    row.lengthM += lengthM;
    laid.set(pipeId, row);
  };
  const uncountedLines: string[] = [];
  for (const line of snapshot.lines) {
    const analysis = analyses.get(line.id);
    if (!analysis) {
      uncountedLines.push(line.name);
      continue;
    }
    for (const stretch of analysis.stretches) lay(stretch.pipe.id, stretch.pipe.label, stretch.slopeLengthM);
  }
  for (const link of snapshot.network?.links ?? []) {
    if (link.kind !== 'pipe' || !link.data.lengthM) continue;
    const pipe = link.data.pipe;
    if (typeof pipe === 'string') lay(pipe, findPipe(pipe)?.label ?? pipe, link.data.lengthM);
    else if (pipe) lay(pipe.id, pipe.label, link.data.lengthM);
    else lay(`link:${link.id}`, `${link.name} (pipe of the ram plan)`, link.data.lengthM);
  }
  const rows = [...laid.entries()]
    .map(([pipeId, { label, lengthM }]) => {
      const costPerM = price.get(pipeId) ?? null;
      return { pipeId, label, lengthM, costPerM, cost: costPerM === null ? null : costPerM * lengthM };
    })
    .sort((a, b) => a.label.localeCompare(b.label));
  return {
    total: rows.reduce((sum, row) => sum + (row.cost ?? 0), 0),
    rows,
    unpricedLengthM: rows.reduce((sum, row) => sum + (row.cost === null ? row.lengthM : 0), 0),
    uncountedLines,
  };
}
