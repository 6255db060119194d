import { teamRoute } from '@/lib/api/route';
import { duplicateLine, teamOfLine } from '@/lib/data/lines';
import { DuplicateLineSchema, LineParams } from '@/lib/validations/lines';

/** A copy of the line on the same route (stretches, devices, settings), named "… (copy)" unless a name is given. */
export const POST = teamRoute(
  {
    params: LineParams,
    body: DuplicateLineSchema,
    permission: 'design.edit',
    teamOf: ({ lineId }) => teamOfLine(lineId),
    status: 201,
  },
  async ({ params, user, body }) => ({ line: await duplicateLine(params.lineId, user.id, body.name) }),
);
