import { z } from 'zod';
import { text } from '@/lib/text';
import { emailSchema, signUpSchema } from '@/lib/auth/schemas';

const currentPassword = text({ error: 'Enter your current password.' }).min(1, 'Enter your current password.').max(200, 'That password is too long.');
const newPassword = signUpSchema.shape.password;
const token = text({ error: 'The reset link is incomplete.' }).trim().min(1, 'The reset link is incomplete.').max(200, 'The reset link is not valid.');

// Forgotten password: the request, and the new password from the mailed link.
export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequestInput = z.input<typeof passwordResetRequestSchema>;

export const passwordResetSchema = z.object({ token, password: newPassword });
export type PasswordResetInput = z.input<typeof passwordResetSchema>;

// Account page: both changes ask for the current password.
export const passwordChangeSchema = z.object({ currentPassword, newPassword });
export type PasswordChangeInput = z.input<typeof passwordChangeSchema>;

export const emailChangeSchema = z.object({ currentPassword, email: emailSchema });
export type EmailChangeInput = z.input<typeof emailChangeSchema>;
