// The schedule's document number (our own rule, common practice, no source).
import { describe, expect, it } from 'vitest';
import { initialsOf, scheduleDocumentNumber } from '@/lib/schedules/document-number';

describe('document number', () => {
  it('takes initials, keeps whole numbers, and drops signs', () => {
    expect(initialsOf('Marrowgate Arts Centre')).toBe('MAC');
    expect(initialsOf('Level 1 – recital room supply')).toBe('L1RRS');
    expect(initialsOf('Block 12, ground floor')).toBe('B12GF');
    expect(initialsOf('Étage 3')).toBe('E3');
    expect(initialsOf('— ·')).toBe('X');
  });

  it('is the same for every revision of a plan and differs between plans with the same initials', () => {
    const first = scheduleDocumentNumber('Marrowgate Arts Centre', 'Level 1 – recital room supply', '5f1c2a7e-0000-4000-8000-00000000a001');
    expect(first).toBe('MAC-L1RRS-5F1C-TS');
    expect(scheduleDocumentNumber('Marrowgate Arts Centre', 'Level 1 - recital room supply', '9b00c1d2-0000-4000-8000-000000000000')).toBe('MAC-L1RRS-9B00-TS');
  });
});
