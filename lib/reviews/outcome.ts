// A review's standing from its rows and decisions, and which outcomes the engineer may stamp on it.
// Accepted needs every row checked and no query; accepted with the notes made needs every row
// marked and something to follow (a query or a note); revise and resubmit needs a query or a note
// saying what to revise; rejected needs a note saying why.
import type { ReviewRow } from '@/lib/revisions/rows';
import { REVIEW_OUTCOMES, type ReviewOutcome } from '@/lib/revisions/states';
import type { Decision } from './decisions';

/** A query raised on a row, as the finishing summary and the mail name it. */
export interface RaisedQuery { row: string; note: string }

export interface ReviewTally {
  rows: number;
  checked: number;
  queries: number;
  /** Rows with no mark yet. */
  unchecked: number;
  /** Rows not yet marked, with no risk mark and no open query: the ones "Check all clear rows" marks. */
  clear: number;
  /** The outcome offered first when the review is finished. */
  suggested: ReviewOutcome;
}

export function tallyReview(rows: readonly ReviewRow[], decisions: ReadonlyMap<string, Decision>, openQueryTargets: ReadonlySet<string> = new Set()): ReviewTally {
  let checked = 0;
  let queries = 0;
  let clear = 0;
  for (const row of rows) {
    const decision = decisions.get(row.target);
    if (decision === 'checked') checked += 1;
    else if (decision === 'query') queries += 1;
    else if (isClearRow(row, openQueryTargets)) clear += 1;
  }
  const unchecked = rows.length - checked - queries;
  return { rows: rows.length, checked, queries, unchecked, clear, suggested: unchecked === 0 && queries === 0 ? 'accepted' : 'revise_resubmit' };
}

/** A row the engineer may check in bulk: the analysis put no risk mark on it and nobody has an open remark on it. */
export function isClearRow(row: ReviewRow, openQueryTargets: ReadonlySet<string>): boolean {
  return !row.atRisk && !openQueryTargets.has(row.target);
}

export interface OutcomeRefusal { message: string; field: 'outcome' | 'note' }

/** Why an outcome cannot be stamped on this review now, in words, with the field to change; null when it can. */
export function outcomeRefusal(tally: ReviewTally, outcome: ReviewOutcome, note: string): OutcomeRefusal | null {
  const hasNote = note.trim().length > 0;
  const unmarked = tally.unchecked === 1 ? '1 row is not checked yet' : `${tally.unchecked} rows are not checked yet`;
  switch (outcome) {
    case 'accepted':
      if (tally.unchecked > 0) return { field: 'outcome', message: `${unmarked}: check or query every row before accepting.` };
      if (tally.queries > 0) return { field: 'outcome', message: `${tally.queries === 1 ? '1 query is' : `${tally.queries} queries are`} raised: accept with the notes made, or ask for a revision.` };
      return null;
    case 'accepted_with_notes':
      if (tally.unchecked > 0) return { field: 'outcome', message: `${unmarked}: check or query every row before accepting.` };
      if (tally.queries === 0 && !hasNote) return { field: 'note', message: 'Write the notes the acoustician is to follow, or raise a query on a row.' };
      return null;
    case 'revise_resubmit':
      if (tally.queries === 0 && !hasNote) return { field: 'note', message: 'Raise a query on a row, or write a note saying what to revise.' };
      return null;
    case 'rejected':
      return hasNote ? null : { field: 'note', message: 'Say in the note why the revision is rejected.' };
  }
}

export function allowedOutcomes(tally: ReviewTally, note: string): ReviewOutcome[] {
  return REVIEW_OUTCOMES.filter((outcome) => outcomeRefusal(tally, outcome, note) === null);
}
