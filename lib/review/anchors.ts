import { z } from 'zod';
import { safeText, uuid } from '../validations/common';
import { chainage } from '../validations/numbers';

const chainageM = chainage('Chainage');

/**
 * Where a comment is pinned: the whole project, a chainage of a line (a pin on its long profile),
 * one of a line's warnings (by its code, at its chainage), a chainage of a survey route, or a part
 * of the network (a node or a link, a pin on the schematic).
 */
export const CommentAnchorSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('project') }),
    z.strictObject({ kind: z.literal('line-chainage'), lineId: uuid('Line id'), chainageM }),
    z.strictObject({
      kind: z.literal('warning'),
      lineId: uuid('Line id'),
      code: safeText('Warning code', 60).pipe(z.string().min(1, 'Warning code is required')),
      chainageM,
    }),
    z.strictObject({ kind: z.literal('route-chainage'), routeId: uuid('Route id'), chainageM }),
    z.strictObject({
      kind: z.literal('network'),
      part: z.enum(['node', 'link'], { error: 'Network part must be node or link' }),
      partId: uuid('Network part id'),
    }),
  ],
  { error: 'Anchor kind must be project, line-chainage, warning, route-chainage or network' },
);
export type CommentAnchor = z.infer<typeof CommentAnchorSchema>;

/** Anchors a surveyor may pin a comment to (routes are their work). */
export function isRouteAnchor(anchor: CommentAnchor): boolean {
  return anchor.kind === 'route-chainage';
}
