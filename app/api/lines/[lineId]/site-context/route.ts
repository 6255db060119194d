import { teamRoute } from '@/lib/api/route';
import { notFound } from '@/lib/errors';
import { lineFeedContext } from '@/lib/data/line-context';
import { getLine, teamOfLine } from '@/lib/data/lines';
import { LineParams } from '@/lib/validations/lines';

/**
 * What the line reads from the rest of its project: the planned ram sites, the site's frost depth, and what the network
 * says feeds it.
 */
export const GET = teamRoute(
  { params: LineParams, permission: 'design.view', teamOf: ({ lineId }) => teamOfLine(lineId) },
  async ({ params }) => {
    const line = await getLine(params.lineId);
    if (!line) throw notFound();
    return lineFeedContext(line.projectId, line.id);
  },
);
