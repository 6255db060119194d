import { teamRoute } from '@/lib/api/route';
import { notFound } from '@/lib/errors';
import { lineSiteContext } from '@/lib/data/line-context';
import { getLine, teamOfLine } from '@/lib/data/lines';
import { LineParams } from '@/lib/validations/lines';

/** What the line reads from the rest of its project: the planned ram sites that can feed it and the site's frost depth. */
export const GET = teamRoute(
  { params: LineParams, permission: 'design.view', teamOf: ({ lineId }) => teamOfLine(lineId) },
  async ({ params }) => {
    const line = await getLine(params.lineId);
    if (!line) throw notFound();
    return lineSiteContext(line.projectId);
  },
);
