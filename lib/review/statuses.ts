/** Where a revision stands in the review cycle. Client-safe: screens and the server share the words. */
export const REVISION_STATUSES = [
  'draft',
  'submitted',
  'changes-requested',
  'approved',
  'issued',
  'superseded',
] as const;
export type RevisionStatus = (typeof REVISION_STATUSES)[number];

export const REVISION_STATUS_LABELS: Record<RevisionStatus, string> = {
  draft: 'Draft',
  submitted: 'Submitted for review',
  'changes-requested': 'Changes requested',
  approved: 'Approved',
  issued: 'Issued for building',
  superseded: 'Superseded',
};

/** Statuses that carry a reviewer's approval (a superseded revision was issued, so it was approved). */
export const APPROVED_STATUSES: readonly RevisionStatus[] = ['approved', 'issued', 'superseded'];
/** What a client (viewer) may see. */
export const CLIENT_VISIBLE_STATUSES: readonly RevisionStatus[] = ['approved', 'issued'];

export function isApproved(status: RevisionStatus): boolean {
  return APPROVED_STATUSES.includes(status);
}
