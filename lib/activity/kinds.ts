// Every kind of line in a plan's activity, with the words shown for it.
export const ACTIVITY_KINDS = {
  'revision.submitted': 'Submitted for review',
  'review.decided': 'Checked or queried rows',
  'review.finished': 'Finished the review',
  'comment.added': 'Commented',
  'comment.answered': 'Answered a comment',
  'comment.resolved': 'Closed out a comment',
  'comment.reopened': 'Reopened a comment',
  'schedule.issued': 'Issued a treatment schedule',
} as const;
export type ActivityKind = keyof typeof ACTIVITY_KINDS;

export function activityLabel(kind: string): string {
  return (ACTIVITY_KINDS as Record<string, string>)[kind] ?? kind;
}
