// The kinds of mail a person can turn off, with the words shown on the account page.
export const NOTIFICATION_KINDS = ['review_requested', 'review_finished', 'mention'] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const NOTIFICATION_LABELS: Record<NotificationKind, { title: string; detail: string }> = {
  review_requested: { title: 'Review requested', detail: 'A plan of your team was submitted for review (sent to engineers and admins).' },
  review_finished: { title: 'Review finished', detail: 'A revision you submitted was reviewed: accepted, accepted with notes, to revise and resubmit, or rejected.' },
  mention: { title: 'Mentions', detail: 'Someone wrote @ and your name in a comment.' },
};
