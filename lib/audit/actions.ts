// Every kind of line in the audit log, with the words shown for it.
export const AUDIT_ACTIONS = {
  'invitation.sent': 'Invitation sent',
  'invitation.resent': 'Invitation sent again',
  'invitation.revoked': 'Invitation withdrawn',
  'invitation.accepted': 'Invitation accepted',
  'member.role_changed': 'Role changed',
  'member.removed': 'Member removed',
  'billing.seats_requested': 'Seat change requested',
  'billing.cancel_requested': 'Cancellation requested',
  'billing.seats_changed': 'Paid seats changed',
  'billing.subscription_ended': 'Subscription ended',
  'billing.payment_failed': 'Payment failed',
  'billing.payment_succeeded': 'Payment received',
} as const;
export type AuditAction = keyof typeof AUDIT_ACTIONS;

export const AUDIT_AREAS = { member: 'Members', invitation: 'Invitations', billing: 'Seats and billing' } as const;
export type AuditArea = keyof typeof AUDIT_AREAS;

export function auditActionLabel(action: string): string {
  return (AUDIT_ACTIONS as Record<string, string>)[action] ?? action;
}
