import { teamRoute } from '@/lib/api/route';
import { notFound } from '@/lib/errors';
import { deleteLine, getLine, teamOfLine, unitSystemOfLine, updateLine } from '@/lib/data/lines';
import { NEW_LINE_WORDS } from '@/lib/validations/field-word-tables';
import { LineParams, UpdateLineSchema } from '@/lib/validations/lines';

const teamOf = ({ lineId }: { lineId: string }) => teamOfLine(lineId);

export const GET = teamRoute({ params: LineParams, permission: 'design.view', teamOf }, async ({ params }) => {
  const line = await getLine(params.lineId);
  if (!line) throw notFound();
  return { line };
});

export const PATCH = teamRoute(
  {
    params: LineParams,
    body: UpdateLineSchema,
    permission: 'design.edit',
    teamOf,
    bodyWords: { table: NEW_LINE_WORDS, unitsOf: ({ lineId }) => unitSystemOfLine(lineId) },
  },
  async ({ params, user, body }) => ({ line: await updateLine(params.lineId, user.id, body) }),
);

export const DELETE = teamRoute({ params: LineParams, permission: 'design.edit', teamOf }, async ({ params, user }) => {
  await deleteLine(params.lineId, user.id);
});
