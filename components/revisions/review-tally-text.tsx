import type { ReviewTally } from '@/lib/reviews/outcome';

// Where a review stands, in words and marks.
export function ReviewTallyText({ tally }: { tally: ReviewTally }) {
  return (
    <p className="num text-sm" data-testid="review-tally">
      <span aria-hidden="true">✓ </span>{tally.checked} checked · <span aria-hidden="true">? </span>{tally.queries} {tally.queries === 1 ? 'query' : 'queries'} · <span aria-hidden="true">○ </span>{tally.unchecked} not checked yet, of {tally.rows} rows.
    </p>
  );
}
