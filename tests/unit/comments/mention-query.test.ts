// What the comment box offers while "@" is typed, and what choosing writes. Product rules; the
// mention itself is matched as lib/comments/mentions.ts reads it (tests/unit/revisions/mentions.test.ts).
import { describe, expect, it } from 'vitest';
import { insertMention, mentionAtCaret, mentionSuggestions } from '@/lib/comments/mention-query';
import { mentionedMembers } from '@/lib/comments/mentions';

const members = ['Ines Varga', 'Tomas Ilves', 'Ida Brandt', 'Olu Varga'];

describe('mentionAtCaret', () => {
  it('finds the "@" being typed before the caret, also at the start and after a space', () => {
    expect(mentionAtCaret('@', 1)).toEqual({ start: 0, text: '' });
    expect(mentionAtCaret('can @In', 7)).toEqual({ start: 4, text: 'In' });
    expect(mentionAtCaret('ask @Ines V', 11)).toEqual({ start: 4, text: 'Ines V' });
  });
  it('does not start a mention inside an e-mail address or after the caret has left it', () => {
    expect(mentionAtCaret('mail ines@example.test', 22)).toBeNull();
    expect(mentionAtCaret('ask @Ines\nthen', 14)).toBeNull();
    expect(mentionAtCaret('no at sign', 10)).toBeNull();
  });
});

describe('mentionSuggestions', () => {
  it('offers names starting with the text first, then names with a word starting with it', () => {
    expect(mentionSuggestions(members, 'i')).toEqual(['Ines Varga', 'Ida Brandt', 'Tomas Ilves']);
    expect(mentionSuggestions(members, 'var')).toEqual(['Ines Varga', 'Olu Varga']);
    expect(mentionSuggestions(members, '')).toEqual(members);
  });
  it('stops offering once a whole name and a space are typed', () => {
    expect(mentionSuggestions(members, 'Ines Varga ')).toEqual([]);
  });
});

describe('insertMention', () => {
  it('writes "@Name " in place of what was typed, and the mail goes to that member', () => {
    const body = 'can @in move the grille?';
    const query = mentionAtCaret(body, 7)!;
    const next = insertMention(body, query, 7, 'Ines Varga');
    expect(next).toEqual({ body: 'can @Ines Varga move the grille?', caret: 16 }); // 'can ' is 4 characters, '@Ines Varga ' 12
    const people = members.map((name, index) => ({ id: String(index), name, email: `${index}@example.test` }));
    expect(mentionedMembers(next.body, people).map((person) => person.name)).toEqual(['Ines Varga']);
  });
});
