import { describe, expect, it } from 'vitest';
import { analyzeRoom } from '@/lib/acoustic';
import { meetingRoom } from './room-fixtures';

// The published NC curves run from NC 15 to NC 70 (ANSI S12.2); a criterion outside them has no curve.
describe('room input', () => {
  it.each([5, 14.9, 75])('criterionNc %s is refused with a RangeError naming the field', (criterionNc) => {
    expect(() => analyzeRoom({ ...meetingRoom, criterionNc })).toThrow(RangeError);
    expect(() => analyzeRoom({ ...meetingRoom, criterionNc })).toThrow(/criterionNc/);
  });

  it('a criterion between two curves is accepted', () => {
    expect(() => analyzeRoom({ ...meetingRoom, criterionNc: 22.5 })).not.toThrow();
  });
});
