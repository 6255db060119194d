import { analyzeLine } from '@/hydraulics';
import { analysisToJson } from '@/lib/lines/analysis-json';
import { userRoute } from '@/lib/api/route';
import { LineInputSchema } from '@/lib/validations/analysis';

/**
 * Analyses a line given whole in the request (stations, stretches, ends, flow, settings; SI units)
 * and returns the profile and its warnings. Pure computation: nothing is stored.
 */
export const POST = userRoute({ body: LineInputSchema, maxBodyBytes: 25_000_000 }, async ({ body }) => ({
  analysis: analysisToJson(analyzeLine(body)),
}));
