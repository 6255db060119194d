import 'server-only';
import type { LineAnalysis } from '../../hydraulics/index';
import { AppError, notFound } from '../errors';
import { lineInputOf } from '../lines/line-input';
import type { LineSiteContext } from '../lines/ram-start';
import type { LineRouteStation } from '../lines/route-stations';
import { runInWorker } from '../workers/pool';
import { lineFeedContext } from './line-context';
import { getLine, stationsOfLine, type LineRecord } from './lines';

export interface AnalysedLine {
  line: LineRecord;
  stations: LineRouteStation[];
  analysis: LineAnalysis;
  /** The ram sites and frost depth the analysis read, as they are now. */
  context: LineSiteContext;
}

/** A saved line with its stations and its analysis, computed now (analyses are never stored). */
export async function analyseSavedLine(lineId: string): Promise<AnalysedLine> {
  const line = await getLine(lineId);
  if (!line) throw notFound();
  if (!line.routeId)
    throw new AppError('bad_request', 'This line has lost its route; pick a route first', {
      routeId: ['Pick a route'],
    });
  const stations = await stationsOfLine(line.routeId, line);
  // What feeds the line comes from the network when it knows (lineFeedOf): start level or head, flow per piece.
  const context = await lineFeedContext(line.projectId, line.id);
  // On the worker pool: a long line's analysis must not hold the request thread.
  return {
    line,
    stations,
    context,
    analysis: await runInWorker('line.analyse', { line: lineInputOf(line.design, stations, context) }),
  };
}
