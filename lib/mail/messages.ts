// The words of each mail: plain, short, with a link to the exact place.
import { ROLE_LABELS, type Role } from '@/lib/permissions';
import type { MailMessage } from './send';

// Mails that go to someone who did not ask for them (invitations, sign-up links and notices)
// carry no text chosen by whoever caused them: no team or person names, no free text. They name
// what happened in our words and link to our pages, which show the rest once opened. Otherwise
// anyone could send their own words to any address under our name.
export function invitationMail(input: { to: string; role: Role; link: string; expiresAt: Date }): MailMessage {
  return {
    to: input.to,
    subject: 'An invitation to join a team on Antinode',
    text: [
      `A team admin on Antinode invited ${input.to} to join their team as ${ROLE_LABELS[input.role].toLowerCase()}.`,
      'The link shows which team and who sent the invitation before you accept.',
      '',
      `See the invitation: ${input.link}`,
      '',
      `The link works once and until ${input.expiresAt.toUTCString()}.`,
      'If you did not expect this, ignore this mail; nothing happens unless you accept.',
    ].join('\n'),
  };
}

export function signUpConfirmMail(input: { to: string; link: string; expiresAt: Date }): MailMessage {
  return {
    to: input.to,
    subject: 'Confirm your address to create your Antinode account',
    text: [
      'Someone asked to create an Antinode account with this address.',
      '',
      `Confirm the address and create the account: ${input.link}`,
      '',
      `The link works once and until ${input.expiresAt.toUTCString()}.`,
      'If it was not you, ignore this mail; no account is created.',
    ].join('\n'),
  };
}

export function signUpExistingAccountMail(input: { to: string; signInLink: string; resetLink: string }): MailMessage {
  return {
    to: input.to,
    subject: 'Someone tried to sign up to Antinode with your address',
    text: [
      'Someone asked to create a new Antinode account with this address, which already has an account. No second account was made.',
      '',
      `If it was you, sign in instead: ${input.signInLink}`,
      `Forgotten the password? Choose a new one: ${input.resetLink}`,
      '',
      'If it was not you, ignore this mail; nothing has changed.',
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
