import { describe, expect, it } from 'vitest';
import type { ReviewRow } from '@/lib/revisions/rows';
import { tallyReview } from '@/lib/reviews/outcome';

const rows: ReviewRow[] = ['a', 'b', 'c'].map((target) => ({ target, kind: 'resonance', runName: 'Run', label: target, frequencyHz: 100 }));

describe('tallyReview', () => {
  it('approves only when every row is accepted', () => {
    expect(tallyReview(rows, new Map([['a', 'accepted'], ['b', 'accepted'], ['c', 'accepted']]))).toEqual({ rows: 3, accepted: 3, flagged: 0, open: 0, outcome: 'approved' });
  });
  it('returns the revision when a row is flagged or left open', () => {
    expect(tallyReview(rows, new Map([['a', 'accepted'], ['b', 'flagged'], ['c', 'accepted']])).outcome).toBe('returned');
    expect(tallyReview(rows, new Map([['a', 'accepted']]))).toMatchObject({ open: 2, outcome: 'returned' });
  });
  it('ignores decisions on rows the revision does not have', () => {
    expect(tallyReview(rows.slice(0, 1), new Map([['a', 'accepted'], ['zzz', 'flagged']])).outcome).toBe('approved');
  });
});
