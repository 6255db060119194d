import { teamRoute } from '@/lib/api/route';
import { analyseSavedLine } from '@/lib/data/line-analysis';
import { teamOfLine } from '@/lib/data/lines';
import { reportPhotosForLine } from '@/lib/data/photos';
import { getProject } from '@/lib/data/projects';
import { notFound } from '@/lib/errors';
import { reportFileName } from '@/lib/lines/file-names';
import { lineReportPdf } from '@/lib/report/line-report';
import { workingCopyStamp } from '@/lib/review/stamp';
import { LineParams, LineReportQuerySchema } from '@/lib/validations/lines';
import { parseQuery } from '@/lib/api/body';

/**
 * The working copy's design report as a PDF, marked not for construction, with the site photos chosen for it; the team
 * (not the
 * client) may export it. `?exaggeration=auto|N` draws the profile at the screen's vertical exaggeration.
 */
export const GET = teamRoute(
  { params: LineParams, permission: 'design.view', teamOf: ({ lineId }) => teamOfLine(lineId) },
  async ({ req, params }) => {
    const query = parseQuery(req, LineReportQuerySchema);
    const { line, analysis, context, stations } = await analyseSavedLine(params.lineId);
    const project = await getProject(line.projectId);
    if (!project) throw notFound();
    const c = analysis.points.chainageM;
    const photos = await reportPhotosForLine(line.routeId, { fromM: c[0], toM: c[c.length - 1] });
    const pdf = await lineReportPdf({
      project,
      line,
      analysis,
      context,
      startGroundM: stations[0].groundElevationM,
      stamp: workingCopyStamp(line.preparedBy),
      generatedAt: new Date(),
      photos,
      stations,
      exaggeration: query.exaggeration,
    });
    return new Response(new Uint8Array(pdf), {
      status: 200,
      headers: {
        'content-type': 'application/pdf',
        'content-disposition': `attachment; filename="${reportFileName(line.name, null, 'pdf')}"`,
        'cache-control': 'no-store',
      },
    });
  },
);
