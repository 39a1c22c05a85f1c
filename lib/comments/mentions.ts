// Finds the team members a comment mentions: "@" followed by a member's name or e-mail.
export interface Mentionable { id: string; name: string; email: string }

function escapeForRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

export function mentionedMembers(body: string, members: readonly Mentionable[]): Mentionable[] {
  return members.filter((member) => [member.name, member.email]
    .filter((handle) => handle.trim().length > 0)
    .some((handle) => new RegExp(`(^|[^\\w@])@${escapeForRegExp(handle)}(?![\\w@.-]*\\w)`, 'iu').test(body)));
}
