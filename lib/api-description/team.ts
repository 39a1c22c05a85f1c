// The team: members, invitations, the practice on schedules, seats and billing, the audit log.
import { auditFilterSchema } from '@/lib/audit/schemas';
import { seatChangeSchema } from '@/lib/billing/schemas';
import { MAX_LOGO_BYTES } from '@/lib/team/practice';
import { invitationInputSchema, roleChangeSchema } from '@/lib/team/schemas';
import { EXAMPLE_IDS } from './examples';
import type { ApiOperation } from './types';

const MEMBER_FIELDS = 'id (the membership), userId, name, email, role, joinedAt';
const INVITATION_FIELDS = 'id, email, role, status (pending, expired), expiresAt, sentAt';
const BILLING_FIELDS = 'state, includedSeats, paidSeats, seats, requestedSeats (waiting for the payment service), hasSubscription, readOnly, paymentFailedAt, usage, seatPrice, currency, interval, totalPerInterval';
const PRACTICE_FIELDS = 'teamName, practiceName, logo (id, fileName, contentType, widthPx, heightPx, or null)';
const AUDIT_EXAMPLE = { kind: 'plan', from: '2026-11-01', to: '2026-11-30' };
const invitation = { invitationId: EXAMPLE_IDS.invitationId };
const member = { memberId: EXAMPLE_IDS.memberId };
const BUDGET = 'Over the invitation budgets (30 mails a day per team, 3 a day per address, one "send again" per 10 minutes); the message says which and when.';

export const TEAM_OPERATIONS: ApiOperation[] = [
  {
    method: 'GET', path: '/api/v1/team/members', area: 'Team', access: 'team.read', summary: 'List the team\'s members',
    body: { kind: 'none' },
    responses: { 200: { description: 'The members.', fields: { members: `Each: ${MEMBER_FIELDS}` } } },
  },
  {
    method: 'PATCH', path: '/api/v1/team/members/{memberId}', area: 'Team', access: 'members.manage', maxBodyBytes: 1024, summary: 'Change a member\'s role',
    pathExample: member,
    body: { kind: 'json', schema: roleChangeSchema, example: { role: 'engineer' }, exampleSummary: 'Make a member the team\'s mechanical engineer' },
    responses: { 200: { description: 'The member.', fields: { member: MEMBER_FIELDS } } },
    refusals: { 409: 'The team would lose its last admin.' },
  },
  {
    method: 'DELETE', path: '/api/v1/team/members/{memberId}', area: 'Team', access: 'members.manage', summary: 'Remove a member from the team',
    description: 'Deletes only the membership: what they made stays, attributed to them.',
    pathExample: member, body: { kind: 'none' },
    responses: { 200: { description: 'Removed.', fields: { removed: 'true' } } },
    refusals: { 409: 'The team would lose its last admin.' },
  },
  {
    method: 'GET', path: '/api/v1/team/invitations', area: 'Team', access: 'members.manage', summary: 'List open invitations',
    body: { kind: 'none' },
    responses: { 200: { description: 'The invitations.', fields: { invitations: `Each: ${INVITATION_FIELDS}` } } },
  },
  {
    method: 'POST', path: '/api/v1/team/invitations', area: 'Team', access: 'members.manage', maxBodyBytes: 2048, summary: 'Invite someone',
    description: 'Mails a link that works once for 7 days. An invitation holds a seat.',
    body: { kind: 'json', schema: invitationInputSchema, example: { email: 'new.colleague@example.test', role: 'architect' }, exampleSummary: 'Invite an architect' },
    responses: { 201: { description: 'The invitation.', fields: { invitation: INVITATION_FIELDS } } },
    refusals: { 409: 'No seat is free (field "seats"), or the address is already a member or invited.', 429: BUDGET },
  },
  {
    method: 'DELETE', path: '/api/v1/team/invitations/{invitationId}', area: 'Team', access: 'members.manage', summary: 'Withdraw an invitation',
    pathExample: invitation, body: { kind: 'none' },
    responses: { 200: { description: 'Withdrawn.', fields: { revoked: 'true' } } },
  },
  {
    method: 'POST', path: '/api/v1/team/invitations/{invitationId}/resend', area: 'Team', access: 'members.manage', summary: 'Send an invitation again (a new link)',
    pathExample: invitation, body: { kind: 'none' },
    responses: { 200: { description: 'The invitation.', fields: { invitation: INVITATION_FIELDS } } },
    refusals: { 429: BUDGET },
  },
  {
    method: 'POST', path: '/api/v1/team/practice/logo', area: 'Team', access: 'members.manage', maxBodyBytes: MAX_LOGO_BYTES + 64 * 1024, summary: 'Upload the practice\'s logo for treatment schedules',
    body: { kind: 'form', field: 'file', description: 'A PNG or JPEG of at most 1 MB and 2000 px a side, as multipart/form-data in the field "file".' },
    responses: { 201: { description: 'The practice as printed on schedules.', fields: { practice: PRACTICE_FIELDS } } },
  },
  {
    method: 'DELETE', path: '/api/v1/team/practice/logo', area: 'Team', access: 'members.manage', summary: 'Remove the practice\'s logo',
    body: { kind: 'none' },
    responses: { 200: { description: 'The practice as printed on schedules.', fields: { practice: PRACTICE_FIELDS } } },
  },
  {
    method: 'GET', path: '/api/v1/team/billing', area: 'Team', access: 'billing.manage', summary: 'Read seats and billing',
    body: { kind: 'none' },
    responses: { 200: { description: 'What is stored.', fields: { billing: BILLING_FIELDS } } },
  },
  {
    method: 'PUT', path: '/api/v1/team/billing/seats', area: 'Team', access: 'billing.manage', maxBodyBytes: 1024, summary: 'Ask for a number of paid seats',
    description: 'Asks the payment service; the seats change when its confirmation arrives.',
    body: { kind: 'json', schema: seatChangeSchema, example: { paidSeats: 4 }, exampleSummary: 'Four paid seats on top of those included' },
    responses: { 202: { description: 'Asked for.', fields: { billing: BILLING_FIELDS } } },
    refusals: { 409: 'Fewer seats than members and invitations hold.' },
  },
  {
    method: 'DELETE', path: '/api/v1/team/billing/subscription', area: 'Team', access: 'billing.manage', summary: 'Cancel the subscription',
    body: { kind: 'none' },
    responses: { 202: { description: 'Asked for.', fields: { billing: BILLING_FIELDS } } },
  },
  {
    method: 'GET', path: '/api/v1/team/audit', area: 'Team', access: 'audit.read', summary: 'Read the audit log',
    query: { schema: auditFilterSchema, example: AUDIT_EXAMPLE }, body: { kind: 'none' },
    responses: { 200: { description: 'Newest first, at most 500 lines.', fields: { events: 'Each: id, at, actorName, action, actionLabel, subject' } } },
  },
  {
    method: 'GET', path: '/api/v1/team/audit/export', area: 'Team', access: 'audit.read', summary: 'Export the audit log as CSV',
    query: { schema: auditFilterSchema, example: AUDIT_EXAMPLE }, body: { kind: 'none' },
    responses: { 200: { description: 'Up to 50,000 lines, UTF-8 with a byte-order mark; cells that a spreadsheet would read as a formula start with \'.', contentType: 'text/csv' } },
  },
  {
    method: 'POST', path: '/api/v1/billing/webhook', area: 'Team', access: 'public', summary: 'Payment service events (called by the payment service)',
    description: 'Trusted only through its signature; events are stored once under their id and answered at once; the job worker then makes the team read its subscription again, retrying while the payment service cannot be asked.',
    body: { kind: 'text', description: 'The event as the payment service signed it.', header: { name: 'Stripe-Signature', description: 'The payment service\'s signature of the body and its time stamp (at most 5 minutes off).' } },
    responses: { 200: { description: 'Received.', fields: { received: 'true', outcome: 'queued (to be applied by the job worker) or duplicate (already received)' } } },
  },
];
