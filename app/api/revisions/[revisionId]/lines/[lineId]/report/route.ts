import { teamRoute } from '@/lib/api/route';
import { revisionLineReport } from '@/lib/data/revision-report';
import { teamOfRevision } from '@/lib/data/revisions';
import { reportFileName } from '@/lib/lines/file-names';
import { RevisionLineParams } from '@/lib/validations/revisions';

/** A line of a revision as a PDF: frozen design, the revision's title block, marked unless approved. */
export const GET = teamRoute(
  { params: RevisionLineParams, permission: 'project.view', teamOf: ({ revisionId }) => teamOfRevision(revisionId) },
  async ({ params, role }) => {
    const { pdf, lineName, number } = await revisionLineReport(params.revisionId, params.lineId, role);
    return new Response(new Uint8Array(pdf), {
      status: 200,
      headers: {
        'content-type': 'application/pdf',
        'content-disposition': `attachment; filename="${reportFileName(lineName, number, 'pdf')}"`,
        'cache-control': 'no-store',
      },
    });
  },
);
