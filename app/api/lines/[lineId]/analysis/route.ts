import { teamRoute } from '@/lib/api/route';
import { analyseSavedLine } from '@/lib/data/line-analysis';
import { teamOfLine } from '@/lib/data/lines';
import { analysisToJson } from '@/lib/lines/analysis-json';
import { LineParams } from '@/lib/validations/lines';

/** Analyses the saved line now (the editor analyses its unsaved draft in the browser with the same core). */
export const POST = teamRoute(
  { params: LineParams, permission: 'design.view', teamOf: ({ lineId }) => teamOfLine(lineId) },
  async ({ params }) => {
    const { line, analysis } = await analyseSavedLine(params.lineId);
    return { lineId: line.id, revision: line.revision, analysis: analysisToJson(analysis) };
  },
);
