// A review's standing from its rows and decisions: approved only when every row is settled
// and none is flagged; otherwise finishing returns the revision with changes requested.
import type { ReviewRow } from '@/lib/revisions/rows';
import type { Decision } from './decisions';

export interface ReviewTally { rows: number; accepted: number; flagged: number; open: number; outcome: 'approved' | 'returned' }

export function tallyReview(rows: readonly ReviewRow[], decisions: ReadonlyMap<string, Decision>): ReviewTally {
  let accepted = 0;
  let flagged = 0;
  for (const row of rows) {
    const decision = decisions.get(row.target);
    if (decision === 'accepted') accepted += 1;
    else if (decision === 'flagged') flagged += 1;
  }
  const open = rows.length - accepted - flagged;
  return { rows: rows.length, accepted, flagged, open, outcome: open === 0 && flagged === 0 ? 'approved' : 'returned' };
}
