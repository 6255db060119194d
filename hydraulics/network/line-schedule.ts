import { HydraulicsInputError } from '../errors';
import type { LineFlowPiece } from '../profile/types';
import type { NetworkSolution } from './types';

/** One link of the network that is a piece of a line: where along the line it starts. */
export interface LinePieceLink {
  linkId: string;
  /** Chainage of the piece's start along the line, m. */
  fromM: number;
  /** True when the link runs against the line's chainage (its `from` is downstream). @default false */
  reversed?: boolean;
}

/**
 * The flow schedule of a line from the solved network: each piece (a link between take-offs) gets
 * its solved flow, signed along the line's chainage, for `analyzeLine` with `flow.kind = 'schedule'`.
 * A piece whose water runs back up the line is refused: the line analysis follows one direction.
 */
export function lineFlowSchedule(pieces: readonly LinePieceLink[], solution: NetworkSolution): LineFlowPiece[] {
  return [...pieces]
    .sort((a, b) => a.fromM - b.fromM)
    .map((piece, index) => {
      const flow = solution.flowsM3s[piece.linkId];
      if (flow === undefined)
        throw new HydraulicsInputError('pieces.linkId', `no link "${piece.linkId}" in the solution`, index);
      const along = piece.reversed ? -flow : flow;
      if (along < -1e-9)
        throw new HydraulicsInputError(
          'pieces.linkId',
          `water in "${piece.linkId}" runs back up the line (${(along * 1000).toFixed(3)} L/s)`,
          index,
        );
      return { fromM: piece.fromM, flowM3s: Math.max(0, along) };
    });
}
