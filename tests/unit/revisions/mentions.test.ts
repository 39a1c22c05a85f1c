import { describe, expect, it } from 'vitest';
import { mentionedMembers } from '@/lib/comments/mentions';

const members = [
  { id: '1', name: 'Ines Varga', email: 'ines@practice.test' },
  { id: '2', name: 'Tomas Reyes', email: 'tomas@practice.test' },
  { id: '3', name: 'Ines', email: 'ines.b@practice.test' },
];

describe('mentionedMembers', () => {
  it('finds a member by "@" and full name, case-insensitive', () => {
    expect(mentionedMembers('@ines varga can you look?', members).map((member) => member.id)).toEqual(['1', '3']);
    expect(mentionedMembers('Ask @Tomas Reyes.', members).map((member) => member.id)).toEqual(['2']);
  });
  it('finds a member by "@" and e-mail address', () => {
    expect(mentionedMembers('cc @ines.b@practice.test', members).map((member) => member.id)).toEqual(['3']);
  });
  it('needs the "@" and a whole name', () => {
    expect(mentionedMembers('Tomas Reyes will check', members)).toEqual([]);
    expect(mentionedMembers('@Tomasz', members)).toEqual([]);
    expect(mentionedMembers('mail tomas@practice.test', members)).toEqual([]);
  });
});
