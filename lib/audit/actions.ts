// Every kind of line in the audit log, with the words shown for it and the area it belongs to.
export const AUDIT_AREAS = {
  sign_in: 'Sign-in',
  member: 'Members',
  invitation: 'Invitations',
  billing: 'Seats and billing',
  plan: 'Projects and plans',
  revision: 'Revisions',
  review: 'Reviews',
  treatment: 'Treatments',
  schedule: 'Treatment schedules',
} as const;
export type AuditArea = keyof typeof AUDIT_AREAS;

export const AUDIT_ACTIONS = {
  'session.signed_in': { label: 'Signed in', area: 'sign_in' },
  'token.created': { label: 'API token created', area: 'sign_in' },
  'token.revoked': { label: 'API token revoked', area: 'sign_in' },
  'invitation.sent': { label: 'Invitation sent', area: 'invitation' },
  'invitation.resent': { label: 'Invitation sent again', area: 'invitation' },
  'invitation.revoked': { label: 'Invitation withdrawn', area: 'invitation' },
  'invitation.accepted': { label: 'Invitation accepted', area: 'invitation' },
  'member.role_changed': { label: 'Role changed', area: 'member' },
  'member.removed': { label: 'Member removed', area: 'member' },
  'team.practice_changed': { label: 'Practice name or logo changed', area: 'member' },
  'billing.seats_requested': { label: 'Seat change requested', area: 'billing' },
  'billing.cancel_requested': { label: 'Cancellation requested', area: 'billing' },
  'billing.seats_changed': { label: 'Paid seats changed', area: 'billing' },
  'billing.subscription_ended': { label: 'Subscription ended', area: 'billing' },
  'billing.payment_failed': { label: 'Payment failed', area: 'billing' },
  'billing.payment_succeeded': { label: 'Payment received', area: 'billing' },
  'project.created': { label: 'Project created', area: 'plan' },
  'project.changed': { label: 'Project changed', area: 'plan' },
  'plan.created': { label: 'Plan created', area: 'plan' },
  'plan.changed': { label: 'Plan renamed or archived', area: 'plan' },
  'plan.drawing_set': { label: 'Plan drawing uploaded', area: 'plan' },
  'plan.drawing_removed': { label: 'Plan drawing removed', area: 'plan' },
  'plan.scale_set': { label: 'Plan scale set', area: 'plan' },
  'revision.submitted': { label: 'Submitted for review', area: 'revision' },
  'review.row_checked': { label: 'Row checked', area: 'review' },
  'review.rows_checked': { label: 'Clear rows checked', area: 'review' },
  'review.query_raised': { label: 'Query raised', area: 'review' },
  'review.finished': { label: 'Review finished', area: 'review' },
  'treatment.chosen': { label: 'Treatment chosen', area: 'treatment' },
  'treatment.removed': { label: 'Treatment removed', area: 'treatment' },
  'schedule.issued': { label: 'Treatment schedule issued', area: 'schedule' },
} as const satisfies Record<string, { label: string; area: AuditArea }>;
export type AuditAction = keyof typeof AUDIT_ACTIONS;

export function isAuditAction(value: string): value is AuditAction {
  return Object.hasOwn(AUDIT_ACTIONS, value);
}

export function isAuditArea(value: string): value is AuditArea {
  return Object.hasOwn(AUDIT_AREAS, value);
}

export function auditActionLabel(action: string): string {
  return isAuditAction(action) ? AUDIT_ACTIONS[action].label : action;
}

/** The actions of one area, in the order above. */
export function actionsOfArea(area: AuditArea): AuditAction[] {
  return (Object.keys(AUDIT_ACTIONS) as AuditAction[]).filter((action) => AUDIT_ACTIONS[action].area === area);
}
