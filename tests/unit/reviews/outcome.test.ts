// The review's standing and which outcomes may be stamped on it. The outcomes are those an
// engineer stamps on a returned submittal (common practice, no source); which outcome needs what
// (every row marked, a query or a note) is this product's rule, written in lib/reviews/outcome.ts.
import { describe, expect, it } from 'vitest';
import type { ReviewRow } from '@/lib/revisions/rows';
import { allowedOutcomes, outcomeRefusal, tallyReview } from '@/lib/reviews/outcome';

const row = (target: string, atRisk = false): ReviewRow => ({ target, kind: 'resonance', runName: 'Run', label: target, frequencyHz: 100, atRisk });
const rows: ReviewRow[] = [row('a'), row('b'), row('c', true)];

describe('tallyReview', () => {
  it('counts checked rows, queries and rows not checked yet, and suggests accepting only a clean review', () => {
    expect(tallyReview(rows, new Map([['a', 'checked'], ['b', 'checked'], ['c', 'checked']]))).toEqual({ rows: 3, checked: 3, queries: 0, unchecked: 0, clear: 0, suggested: 'accepted' });
    expect(tallyReview(rows, new Map([['a', 'checked'], ['b', 'query'], ['c', 'checked']]))).toMatchObject({ queries: 1, unchecked: 0, suggested: 'revise_resubmit' });
    expect(tallyReview(rows, new Map([['a', 'checked']]))).toMatchObject({ unchecked: 2, suggested: 'revise_resubmit' });
  });

  it('counts as clear only unmarked rows with no risk mark and no open remark', () => {
    expect(tallyReview(rows, new Map()).clear).toBe(2); // c is near a fan tone
    expect(tallyReview(rows, new Map(), new Set(['b'])).clear).toBe(1); // b has an open remark
    expect(tallyReview(rows, new Map([['a', 'query']])).clear).toBe(1); // a is queried already
  });

  it('ignores decisions on rows the revision does not have', () => {
    expect(tallyReview(rows.slice(0, 1), new Map([['a', 'checked'], ['zzz', 'query']]))).toMatchObject({ rows: 1, checked: 1, queries: 0, suggested: 'accepted' });
  });
});

describe('outcomeRefusal', () => {
  const clean = tallyReview(rows, new Map([['a', 'checked'], ['b', 'checked'], ['c', 'checked']]));
  const queried = tallyReview(rows, new Map([['a', 'checked'], ['b', 'query'], ['c', 'checked']]));
  const partial = tallyReview(rows, new Map([['a', 'checked']]));

  it('accepts only when every row is checked and none is queried', () => {
    expect(outcomeRefusal(clean, 'accepted', '')).toBeNull();
    expect(outcomeRefusal(queried, 'accepted', '')).toMatchObject({ field: 'outcome', message: expect.stringContaining('1 query is raised') });
    expect(outcomeRefusal(partial, 'accepted', 'fine')).toMatchObject({ field: 'outcome', message: expect.stringContaining('2 rows are not checked yet') });
  });

  it('accepts with the notes made when every row is marked and there is something to follow', () => {
    expect(outcomeRefusal(queried, 'accepted_with_notes', '')).toBeNull();
    expect(outcomeRefusal(clean, 'accepted_with_notes', '')).toMatchObject({ field: 'note' });
    expect(outcomeRefusal(clean, 'accepted_with_notes', 'Move the grille 300 mm east on site.')).toBeNull();
    expect(outcomeRefusal(partial, 'accepted_with_notes', 'note')).toMatchObject({ field: 'outcome' });
  });

  it('asks for a revision only with a query or a note, and rejects only with a note', () => {
    expect(outcomeRefusal(partial, 'revise_resubmit', '')).toMatchObject({ field: 'note' });
    expect(outcomeRefusal(partial, 'revise_resubmit', 'Check the riser length.')).toBeNull();
    expect(outcomeRefusal(queried, 'revise_resubmit', '')).toBeNull();
    expect(outcomeRefusal(queried, 'rejected', '   ')).toMatchObject({ field: 'note' });
    expect(outcomeRefusal(partial, 'rejected', 'Wrong fan: the plan shows the extract unit.')).toBeNull();
  });

  it('lists what may be stamped now', () => {
    expect(allowedOutcomes(clean, '')).toEqual(['accepted']);
    expect(allowedOutcomes(queried, '')).toEqual(['accepted_with_notes', 'revise_resubmit']);
    expect(allowedOutcomes(partial, 'why')).toEqual(['revise_resubmit', 'rejected']);
  });
});
