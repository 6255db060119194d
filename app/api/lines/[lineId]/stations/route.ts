import { teamRoute } from '@/lib/api/route';
import { notFound } from '@/lib/errors';
import { getLine, stationsOfLine, teamOfLine } from '@/lib/data/lines';
import { LineParams } from '@/lib/validations/lines';

/** The stations the line follows: its route cut to the line's window, with map positions. */
export const GET = teamRoute(
  { params: LineParams, permission: 'design.view', teamOf: ({ lineId }) => teamOfLine(lineId) },
  async ({ params }) => {
    const line = await getLine(params.lineId);
    if (!line) throw notFound();
    if (!line.routeId) return { routeId: null, stations: [] };
    return { routeId: line.routeId, stations: await stationsOfLine(line.routeId, line) };
  },
);
