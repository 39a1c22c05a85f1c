// The words of each notification mail: plain, short, with a link to the exact place.
import type { MailMessage } from '@/lib/mail/send';

const FOOTER = 'You can turn these mails off on your Antinode account page.';

/** Where a revision sits, as every review mail names it. */
export interface RevisionPlace { projectName: string; planName: string; number: number }

function placeOf(place: RevisionPlace): string {
  return `${place.projectName}: ${place.planName}, revision ${place.number}`;
}

function quoted(text: string): string[] {
  return text.split(/\r?\n/).map((line) => `  ${line}`);
}

export function reviewRequestedMail(input: { to: string; submitterName: string; place: RevisionPlace; note: string; link: string }): MailMessage {
  return {
    to: input.to,
    subject: `Review requested: ${placeOf(input.place)}`,
    text: [
      `${input.submitterName} submitted revision ${input.place.number} of ${input.place.planName} (project ${input.place.projectName}) for review.`,
      ...(input.note ? ['', `${input.submitterName}'s note:`, ...quoted(input.note)] : []),
      '',
      `Open the revision: ${input.link}`,
      '',
      FOOTER,
    ].join('\n'),
  };
}

export function reviewFinishedMail(input: {
  to: string; reviewerName: string; place: RevisionPlace; outcome: string; meaning: string; note: string; queries: readonly { row: string; note: string }[]; link: string;
}): MailMessage {
  return {
    to: input.to,
    subject: `Review finished: ${placeOf(input.place)}, ${input.outcome.toLowerCase()}`,
    text: [
      `${input.reviewerName} finished the review of revision ${input.place.number} of ${input.place.planName} (project ${input.place.projectName}).`,
      '',
      `Outcome: ${input.outcome}. ${input.meaning}`,
      ...(input.note ? ['', `${input.reviewerName}'s note:`, ...quoted(input.note)] : []),
      ...(input.queries.length > 0 ? ['', `Queries on rows (${input.queries.length}):`, ...input.queries.map((query) => `  - ${query.row}: ${query.note}`)] : []),
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
