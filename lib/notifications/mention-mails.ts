// Mails the team members a new comment mentions (never its author).
import { commentPath } from '@/lib/comments/links';
import { mentionedMembers } from '@/lib/comments/mentions';
import type { CreatedComment } from '@/lib/comments/data';
import { appUrl } from '@/lib/tokens';
import { mentionMail } from './messages';
import { notify } from './notify';
import { teamMembers } from './recipients';

const EXCERPT_CHARS = 280;

export async function announceMentions(teamId: string, author: { id: string; name: string }, created: CreatedComment): Promise<string[]> {
  const members = await teamMembers(teamId);
  const mentioned = mentionedMembers(created.comment.body, members).filter((member) => member.id !== author.id);
  const link = appUrl(commentPath(created.comment.planId, created.revisionNumber, created.comment.parentId ?? created.comment.id));
  const body = created.comment.body;
  const excerpt = body.length > EXCERPT_CHARS ? `${body.slice(0, EXCERPT_CHARS)}…` : body;
  const sent = await Promise.all(mentioned.map(async (member) => (await notify(member, 'mention', mentionMail({
    to: member.email, authorName: author.name, planName: created.planName, excerpt, link,
  }))) ? member.email : null));
  return sent.filter((email): email is string => email !== null);
}
