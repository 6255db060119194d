import 'server-only';
import { AppError, notFound } from '../errors';
import { lineReportPdf } from '../report/line-report';
import { analyseSnapshotLine, snapshotLine } from '../review/snapshot-analysis';
import { revisionStamp } from '../review/stamp';
import type { Role } from '../roles';
import { getRevision } from './revisions';

/**
 * The PDF of one line of a revision, made only from the frozen snapshot: later edits to the working
 * copy cannot change it. Its date is the revision's own, so the same revision and status give the
 * same bytes every time.
 */
export async function revisionLineReport(
  revisionId: string,
  lineId: string,
  role: Role,
): Promise<{ pdf: Buffer; lineName: string; number: number }> {
  const revision = await getRevision(revisionId, role);
  const line = snapshotLine(revision.snapshot, lineId);
  if (!line) throw notFound('That line is not part of this revision');
  const analysis = analyseSnapshotLine(line);
  if (!analysis)
    throw new AppError(
      'bad_request',
      `Line "${line.name}" could not be analysed in revision ${revision.number}: ${line.problem ?? 'too few stations'}`,
    );
  const stamp = revisionStamp({
    number: revision.number,
    status: revision.status,
    designerName: revision.createdBy?.name ?? null,
    reviewerName: revision.reviewedBy?.name ?? null,
    reviewedAt: revision.reviewedAt,
  });
  const pdf = await lineReportPdf({
    project: { name: revision.snapshot.project.name, unitSystem: revision.snapshot.project.unitSystem },
    line: {
      id: line.id,
      projectId: revision.projectId,
      routeId: line.routeId,
      routeName: line.routeName,
      name: line.name,
      notes: line.notes,
      fromChainageM: line.fromChainageM,
      toChainageM: line.toChainageM,
      revision: revision.number,
      preparedBy: revision.createdBy?.name ?? null,
      design: line.design,
      createdAt: revision.createdAt,
      updatedAt: revision.createdAt,
    },
    analysis,
    context: line.context,
    startGroundM: line.stations[0].groundElevationM,
    stamp,
    generatedAt: new Date(revision.createdAt),
    stations: line.stations,
  });
  return { pdf, lineName: line.name, number: revision.number };
}
