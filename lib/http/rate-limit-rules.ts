// Every budget of lib/http/rate-limit.ts: points within a window, and the refusal in words.
// The figures are product rules, set well above what one honest person does and far below what
// a script does; bursts of mail to one recipient are capped the hardest, since each is a mail
// somebody did not ask for (common practice, no source).
import { createHash } from 'node:crypto';

const MINUTE_S = 60;
const HOUR_S = 3600;
const DAY_S = 86_400;

/** Analyses one person may start per minute (each save of a plan asks for one). */
export const ANALYSIS_PER_MINUTE = Number(process.env.ANTINODE_ANALYSIS_RATE_PER_MINUTE ?? 120);

/** "40 s", "3 minutes", "2 hours": how long until a budget comes back, in words. */
export function waitInWords(seconds: number): string {
  if (seconds < 90) return `${Math.max(1, Math.ceil(seconds))} s`;
  const minutes = Math.ceil(seconds / 60);
  return minutes < 120 ? `${minutes} minutes` : `${Math.ceil(minutes / 60)} hours`;
}

export interface RateLimitRule { points: number; durationS: number; refusal: (retryAfterS: number) => string }

export const RATE_LIMIT_RULES = {
  analysis: {
    points: ANALYSIS_PER_MINUTE, durationS: MINUTE_S,
    refusal: (s: number) => `You have started more than ${ANALYSIS_PER_MINUTE} analyses in a minute; try again in ${s} s.`,
  },
  // Sign-up requests from one address (each may send a mail).
  signUpPerAddress: {
    points: 10, durationS: HOUR_S,
    refusal: (s: number) => `Too many sign-ups from your network. Try again in ${waitInWords(s)}.`,
  },
  // Sign-up mails (the link, or the notice to an existing account) to one address. Over it, no
  // mail goes; the answer stays the same.
  signUpMailsPerRecipient: { points: 3, durationS: DAY_S, refusal: () => '' },
  // Password-reset requests from one address.
  resetPerAddress: {
    points: 20, durationS: HOUR_S,
    refusal: (s: number) => `Too many password-reset requests from your network. Try again in ${waitInWords(s)}.`,
  },
  // Reset mails to one account (besides at most one a minute). Over it, no mail goes.
  resetMailsPerAccount: { points: 5, durationS: DAY_S, refusal: () => '' },
  // Invitation mails (new or sent again) of one team.
  invitationMailsPerTeam: {
    points: 30, durationS: DAY_S,
    refusal: (s: number) => `This team has sent 30 invitation mails in the last day, the most allowed. Try again in ${waitInWords(s)}.`,
  },
  // Invitation mails to one address, from any team.
  invitationMailsPerRecipient: {
    points: 3, durationS: DAY_S,
    refusal: (s: number) => `That address has been sent 3 invitations in the last day, the most allowed. Try again in ${waitInWords(s)}.`,
  },
  // "Send again" on one invitation.
  invitationResend: {
    points: 1, durationS: 10 * MINUTE_S,
    refusal: (s: number) => `This invitation was sent less than 10 minutes ago. Give the mail time to arrive; you can send it again in ${waitInWords(s)}.`,
  },
  // Wrong current passwords (account page) within one session, and for one account.
  currentPasswordPerSession: {
    points: 5, durationS: 15 * MINUTE_S,
    refusal: (s: number) => `Too many wrong current passwords. Nothing was changed; try again in ${waitInWords(s)}, or sign out and reset the password.`,
  },
  currentPasswordPerAccount: {
    points: 10, durationS: HOUR_S,
    refusal: (s: number) => `Too many wrong current passwords for this account. Nothing was changed; try again in ${waitInWords(s)}, or sign out and reset the password.`,
  },
  // Failed sign-ins, counted per account and address, per address, per account (lib/auth/throttle.ts).
  signInFailuresPair: { points: 10_000, durationS: HOUR_S, refusal: () => '' },
  signInFailuresAddress: { points: 10_000, durationS: HOUR_S, refusal: () => '' },
  signInFailuresAccount: { points: 10_000, durationS: HOUR_S, refusal: () => '' },
} satisfies Record<string, RateLimitRule>;

export type RateLimitName = keyof typeof RATE_LIMIT_RULES;

/** An e-mail address as a budget key: hashed, so the table holds no addresses and keys stay short. */
export function emailKey(email: string): string {
  return createHash('sha256').update(email.trim().toLowerCase(), 'utf8').digest('hex').slice(0, 40);
}
