import { z } from 'zod';
import { text } from '@/lib/text';
import { emailSchema, signUpSchema } from '@/lib/auth/schemas';
import { ROLES, type Role } from '@/lib/permissions';

export const roleSchema = z.enum(ROLES as unknown as [Role, ...Role[]], { error: 'Pick one of the roles.' });

// Shared by the invite form and POST /api/v1/team/invitations.
export const invitationInputSchema = z.object({
  email: emailSchema,
  role: roleSchema,
});
export type InvitationInput = z.input<typeof invitationInputSchema>;

// Shared by the role menu and PATCH /api/v1/team/members/[memberId].
export const roleChangeSchema = z.object({ role: roleSchema });

const tokenSchema = text({ error: 'The invitation link is incomplete.' }).trim().min(1, 'The invitation link is incomplete.').max(200, 'The invitation link is not valid.');

// Accepting: a new person names themselves and chooses a password; someone with an account
// proves it is theirs with their password (or is already signed in as the invited address).
export const acceptAsNewSchema = z.object({ token: tokenSchema, name: signUpSchema.shape.name, password: signUpSchema.shape.password });
export const acceptAsExistingSchema = z.object({ token: tokenSchema, password: text({ error: 'Enter your password.' }).min(1, 'Enter your password.').max(200, 'That password is too long.') });
export const acceptInvitationSchema = z.object({
  token: tokenSchema,
  name: text().trim().max(120, 'Keep the name under 120 characters.').optional(),
  password: text().max(200, 'That password is too long.').optional(),
});
export type AcceptAsNewInput = z.input<typeof acceptAsNewSchema>;
export type AcceptAsExistingInput = z.input<typeof acceptAsExistingSchema>;
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

// Shared by the practice form on the team page and its server action: the name printed on treatment schedules.
export const practiceNameSchema = z.object({
  practiceName: text().trim().max(120, 'Keep the practice name under 120 characters.'),
});
export type PracticeNameInput = z.input<typeof practiceNameSchema>;
