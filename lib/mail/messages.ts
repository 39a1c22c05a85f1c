// The words of each mail: plain, short, with a link to the exact place.
import { ROLE_LABELS, type Role } from '@/lib/permissions';
import type { MailMessage } from './send';

export function invitationMail(input: { to: string; teamName: string; inviterName: string; role: Role; link: string; expiresAt: Date }): MailMessage {
  return {
    to: input.to,
    subject: `${input.inviterName} invited you to ${input.teamName} on Antinode`,
    text: [
      `${input.inviterName} invited you to join ${input.teamName} on Antinode as ${ROLE_LABELS[input.role].toLowerCase()}.`,
      '',
      `Accept the invitation: ${input.link}`,
      '',
      `The link works once and until ${input.expiresAt.toUTCString()}.`,
      'If you did not expect this, ignore this mail.',
    ].join('\n'),
  };
}

export function passwordResetMail(input: { to: string; link: string; expiresAt: Date }): MailMessage {
  return {
    to: input.to,
    subject: 'Choose a new Antinode password',
    text: [
      'Someone asked to reset the password of your Antinode account.',
      '',
      `Choose a new password: ${input.link}`,
      '',
      `The link works once and until ${input.expiresAt.toUTCString()}.`,
      'If you did not ask for this, ignore this mail; your password stays as it is.',
    ].join('\n'),
  };
}

export function emailChangedMail(input: { to: string; newEmail: string; link: string }): MailMessage {
  return {
    to: input.to,
    subject: 'Your Antinode e-mail address was changed',
    text: [
      `The e-mail address of your Antinode account is now ${input.newEmail}; this address no longer signs in.`,
      '',
      `If you did not do this, reset the password from ${input.link} using the new address, or ask your team admin for help.`,
    ].join('\n'),
  };
}
