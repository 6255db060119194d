/**
 * Everything the activity feed records. Notifications hang off these kinds (recordActivity in lib/activity/record.ts).
 */
export type ActivityKind =
  | 'survey.imported'
  | 'route.cleaned'
  | 'line.created'
  | 'line.edited'
  | 'line.deleted'
  | 'revision.created'
  | 'revision.submitted'
  | 'revision.changes-requested'
  | 'revision.approved'
  | 'revision.issued'
  | 'revision.superseded'
  | 'comment.added'
  | 'comment.resolved'
  | 'comment.reopened'
  | 'line.review-state-carried-over';

export const ACTIVITY_KINDS: readonly ActivityKind[] = [
  'survey.imported',
  'route.cleaned',
  'line.created',
  'line.edited',
  'line.deleted',
  'revision.created',
  'revision.submitted',
  'revision.changes-requested',
  'revision.approved',
  'revision.issued',
  'revision.superseded',
  'comment.added',
  'comment.resolved',
  'comment.reopened',
  'line.review-state-carried-over',
];

export const ACTIVITY_KIND_LABELS: Record<ActivityKind, string> = {
  'survey.imported': 'Survey imports',
  'route.cleaned': 'Route clean-ups',
  'line.created': 'Lines added',
  'line.edited': 'Line edits',
  'line.deleted': 'Lines removed',
  'revision.created': 'Revisions made',
  'revision.submitted': 'Submitted for review',
  'revision.changes-requested': 'Changes requested',
  'revision.approved': 'Approvals',
  'revision.issued': 'Issued for building',
  'revision.superseded': 'Superseded',
  'comment.added': 'Comments',
  'comment.resolved': 'Comments resolved',
  'comment.reopened': 'Comments reopened',
  'line.review-state-carried-over': 'Carried over from before revisions',
};
