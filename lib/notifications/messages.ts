// The words of each notification mail: plain, short, with a link to the exact place.
import type { MailMessage } from '@/lib/mail/send';

const FOOTER = 'You can turn these mails off on your Antinode account page.';

export function reviewRequestedMail(input: { to: string; submitterName: string; planName: string; number: number; link: string }): MailMessage {
  return {
    to: input.to,
    subject: `Review requested: ${input.planName}, revision ${input.number}`,
    text: [
      `${input.submitterName} submitted revision ${input.number} of ${input.planName} for review.`,
      '',
      `Open the revision: ${input.link}`,
      '',
      FOOTER,
    ].join('\n'),
  };
}

export function reviewFinishedMail(input: { to: string; reviewerName: string; planName: string; number: number; outcome: string; link: string }): MailMessage {
  return {
    to: input.to,
    subject: `Review finished: ${input.planName}, revision ${input.number} (${input.outcome})`,
    text: [
      `${input.reviewerName} finished the review of revision ${input.number} of ${input.planName}: ${input.outcome}.`,
      '',
      `Open the revision: ${input.link}`,
      '',
      FOOTER,
    ].join('\n'),
  };
}

export function mentionMail(input: { to: string; authorName: string; planName: string; excerpt: string; link: string }): MailMessage {
  return {
    to: input.to,
    subject: `${input.authorName} mentioned you on ${input.planName}`,
    text: [
      `${input.authorName} mentioned you in a comment on ${input.planName}:`,
      '',
      `  “${input.excerpt}”`,
      '',
      `Open the comment: ${input.link}`,
      '',
      FOOTER,
    ].join('\n'),
  };
}
