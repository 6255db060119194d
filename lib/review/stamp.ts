import { isApproved, REVISION_STATUS_LABELS, type RevisionStatus } from './statuses';

/**
 * What the title block of a drawing or report says about review: which revision, its status, who
 * designed and who reviewed it, when it was approved, and whether it may be built from. Shared by
 * the PDF, the SVG export and the screen so all three say the same.
 */
export interface ReviewStamp {
  /** "Revision 3" or "Working copy". */
  revisionLabel: string;
  statusLabel: string;
  designer: string | null;
  reviewer: string | null;
  /** YYYY-MM-DD, or null when not approved. */
  approvedOn: string | null;
  /** Only an approved (or issued) revision may be built from; everything else is marked. */
  forConstruction: boolean;
  /** Why it is not for construction, in a few words. */
  markReason: string | null;
}

export const NOT_FOR_CONSTRUCTION = 'NOT FOR CONSTRUCTION';

export function workingCopyStamp(designer: string | null): ReviewStamp {
  return {
    revisionLabel: 'Working copy',
    statusLabel: 'Not a revision: not reviewed',
    designer,
    reviewer: null,
    approvedOn: null,
    forConstruction: false,
    markReason: 'working copy, not reviewed',
  };
}

export function revisionStamp(revision: {
  number: number;
  status: RevisionStatus;
  designerName: string | null;
  reviewerName: string | null;
  reviewedAt: string | null;
}): ReviewStamp {
  const approved = isApproved(revision.status);
  const forConstruction = revision.status === 'approved' || revision.status === 'issued';
  return {
    revisionLabel: `Revision ${revision.number}`,
    statusLabel: REVISION_STATUS_LABELS[revision.status],
    designer: revision.designerName,
    reviewer: revision.reviewerName,
    approvedOn: approved && revision.reviewedAt ? revision.reviewedAt.slice(0, 10) : null,
    forConstruction,
    markReason: forConstruction
      ? null
      : revision.status === 'superseded'
        ? 'superseded by a later revision'
        : `${REVISION_STATUS_LABELS[revision.status].toLowerCase()}, not approved`,
  };
}

/** The title-block rows, in order, as label and value. */
export function stampRows(stamp: ReviewStamp): [string, string][] {
  return [
    ['Revision', stamp.revisionLabel],
    ['Status', stamp.statusLabel],
    ['Designer', stamp.designer ?? '\u2014'],
    ['Reviewer', stamp.reviewer ?? 'not yet reviewed'],
    ['Approved on', stamp.approvedOn ?? 'not approved'],
  ];
}
