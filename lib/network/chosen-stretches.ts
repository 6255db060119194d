import type { LinkPieceResult } from './run-result';

/** A stretch of one pipe along a line, SI chainage. */
export interface ChosenStretch {
  fromM: number;
  toM: number;
  pipe: string;
}

/** Chainages closer than this are the same point (the pieces were cut from the line's own stations). */
const SAME_CHAINAGE_M = 1e-6;

/**
 * A line's pipe stretches from the sized pieces of its link: pieces in chainage order, neighbours
 * with the same pipe joined into one stretch. Returns null when the pieces do not cover the line's
 * window end to end (the line changed since it was sized).
 */
export function stretchesFromPieces(
  pieces: readonly LinkPieceResult[],
  window: { fromM: number; toM: number },
): ChosenStretch[] | null {
  const sorted = [...pieces].sort((a, b) => (a.fromChainageM ?? 0) - (b.fromChainageM ?? 0));
  if (sorted.length === 0) return null;
  const stretches: ChosenStretch[] = [];
  let at = window.fromM;
  for (const piece of sorted) {
    if (piece.fromChainageM === null || piece.toChainageM === null) return null;
    if (Math.abs(piece.fromChainageM - at) > SAME_CHAINAGE_M) return null;
    const last = stretches[stretches.length - 1];
    if (last && last.pipe === piece.pipeId) last.toM = piece.toChainageM;
    else stretches.push({ fromM: at, toM: piece.toChainageM, pipe: piece.pipeId });
    at = piece.toChainageM;
  }
  if (Math.abs(at - window.toM) > SAME_CHAINAGE_M) return null;
  stretches[stretches.length - 1].toM = window.toM;
  return stretches;
}
