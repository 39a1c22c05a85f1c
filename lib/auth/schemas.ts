import { z } from 'zod';
import { text } from '@/lib/text';

// Shared by the sign-in and sign-up forms and their routes.
export const emailSchema = z
  .string({ error: 'Enter your e-mail address.' })
  .trim()
  .min(1, 'Enter your e-mail address.')
  .max(320, 'That e-mail address is too long.')
  .email('That does not look like an e-mail address.')
  .transform((value) => value.toLowerCase());

export const signInSchema = z.object({
  email: emailSchema,
  password: text({ error: 'Enter your password.' }).min(1, 'Enter your password.').max(200, 'That password is too long.'),
});
export type SignInInput = z.input<typeof signInSchema>;

export const signUpSchema = z.object({
  name: text({ error: 'Enter your name.' }).trim().min(1, 'Enter your name.').max(120, 'Keep the name under 120 characters.'),
  email: emailSchema,
  password: text({ error: 'Choose a password.' }).min(10, 'Use at least 10 characters.').max(200, 'Keep the password under 200 characters.'),
  teamName: text({ error: 'Name your team.' }).trim().min(1, 'Name your team, e.g. your practice.').max(120, 'Keep the team name under 120 characters.'),
});
export type SignUpInput = z.input<typeof signUpSchema>;

// The link from the sign-up mail.
export const signUpConfirmSchema = z.object({
  token: text({ error: 'The confirmation link is incomplete.' }).trim().min(1, 'The confirmation link is incomplete.').max(200, 'The confirmation link is not valid.'),
});

// Switching the team a session works in (PUT /api/v1/sessions/current).
export const switchTeamSchema = z.object({ teamId: z.uuid('teamId must be a team id') });
