import type { NextRequest } from 'next/server';
import { HydraulicsInputError } from '@/hydraulics/index';
import { lineDesignRefusal } from '@/lib/api/domain-errors';
import { userRoute } from '@/lib/api/route';
import { AppError } from '@/lib/errors';
import { enforce } from '@/lib/rate-limits';
import { analysisToJson } from '@/lib/lines/analysis-json';
import {
  ANALYSIS_LIMIT,
  AnalysisQuerySchema,
  LineInputSchema,
  MAX_STATELESS_ANALYSIS_BYTES,
  MAX_STATELESS_ANALYSIS_STATIONS,
} from '@/lib/validations/analysis';
import { LINE_DESIGN_WORDS } from '@/lib/validations/field-word-tables';
import { parseQuery } from '@/lib/api/body';
import { runInWorker } from '@/lib/workers/pool';

const queryOf = (req: NextRequest) => parseQuery(req, AnalysisQuerySchema);

/**
 * Analyses a line given whole in the request (stations, stretches, ends, flow, settings; SI units)
 * and returns the profile and its warnings. Pure computation: nothing is stored. Open to every
 * account, so it is limited per user, capped in stations, run on the worker pool, and its profile
 * is thinned when the caller asks (`?profilePoints=N`). A refusal is worded as a saved line's is,
 * through the same table and mapping, in the unit system `?units=` names (metric by default).
 */
export const POST = userRoute(
  {
    body: LineInputSchema,
    maxBodyBytes: MAX_STATELESS_ANALYSIS_BYTES,
    bodyWords: { table: LINE_DESIGN_WORDS, unitsOf: (_params, req) => queryOf(req).units },
  },
  async ({ req, body, user }) => {
    const query = queryOf(req);
    if (body.stations.length > MAX_STATELESS_ANALYSIS_STATIONS) {
      const message = `At most ${MAX_STATELESS_ANALYSIS_STATIONS.toLocaleString('en-US')} stations can be analysed here; save the line and analyse it from its page`;
      throw new AppError('bad_request', message, { stations: [message] });
    }
    await enforce(ANALYSIS_LIMIT, `user:${user.id}`, 'Too many analyses in a short time; wait a little and try again');
    const analysis = await runInWorker('line.analyse', { line: body, profilePoints: query.profilePoints }).catch(
      (error: unknown) => {
        throw error instanceof HydraulicsInputError ? lineDesignRefusal(error, query.units, '') : error;
      },
    );
    return { analysis: analysisToJson(analysis) };
  },
);
