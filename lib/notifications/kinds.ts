/** The kinds of notification a person can turn on or off (all on until they choose). */
export const NOTIFICATION_KINDS = [
  'revision-submitted',
  'revision-approved',
  'revision-changes-requested',
  'comment-mention',
  'invitation-accepted',
] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const NOTIFICATION_LABELS: Record<NotificationKind, { label: string; hint: string }> = {
  'revision-submitted': { label: 'A revision waits for review', hint: 'For owners and reviewers of the team.' },
  'revision-approved': {
    label: 'My revision was approved',
    hint: 'When a reviewer approves a revision you submitted.',
  },
  'revision-changes-requested': {
    label: 'My revision was sent back',
    hint: 'When a reviewer asks for changes to a revision you submitted.',
  },
  'comment-mention': { label: 'Someone mentions me in a comment', hint: 'An @mention in a review comment.' },
  'invitation-accepted': { label: 'Someone accepts my invitation', hint: 'When a person you invited joins the team.' },
};

export type NotificationPreferences = Record<NotificationKind, boolean>;
