// The "@" being typed at the caret of a comment, and the team members it could mean: what the
// comment box offers as suggestions. Pure, for the form and its tests.

export interface MentionQuery {
  /** Where the "@" is in the text. */
  start: number;
  /** What follows it up to the caret. */
  text: string;
}

const MAX_QUERY_CHARS = 40;

/** The mention being typed just before the caret, or null. An "@" inside a word (an e-mail address) does not start one. */
export function mentionAtCaret(body: string, caret: number): MentionQuery | null {
  const before = body.slice(0, caret);
  const at = before.lastIndexOf('@');
  if (at < 0) return null;
  if (at > 0 && /[\w@.]/.test(before[at - 1])) return null;
  const text = before.slice(at + 1);
  if (text.length > MAX_QUERY_CHARS || /[\n@]/.test(text) || /\s{2}/.test(text) || /^\s/.test(text)) return null;
  return { start: at, text };
}

/** Members whose name (or any word of it) starts with the text, first those whose whole name does; at most `limit`. A text ending in a space after a whole name matches nothing: the mention is finished. */
export function mentionSuggestions(members: readonly string[], text: string, limit = 6): string[] {
  const wanted = text.toLocaleLowerCase();
  const starts = members.filter((name) => name.toLocaleLowerCase().startsWith(wanted));
  const words = members.filter((name) => !starts.includes(name) && name.toLocaleLowerCase().split(/\s+/).some((word) => word.startsWith(wanted)));
  return [...starts, ...words].slice(0, limit);
}

/** The text with the mention replaced by "@Name " and the caret after it. */
export function insertMention(body: string, query: MentionQuery, caret: number, name: string): { body: string; caret: number } {
  const inserted = `@${name} `;
  const rest = body.slice(caret).replace(/^ /, '');
  return { body: body.slice(0, query.start) + inserted + rest, caret: query.start + inserted.length };
}
