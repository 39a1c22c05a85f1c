// The engineer's mark on one row of a revision, in words (never colour alone): the row is checked,
// or a query is raised on it with the question to answer.
export const DECISIONS = ['checked', 'query'] as const;
export type Decision = (typeof DECISIONS)[number];

export const DECISION_LABELS: Record<Decision, string> = { checked: 'Checked', query: 'Query' };

/** The mark beside each decision's words, and for a row not yet checked. */
export const DECISION_MARKS: Record<Decision | 'none', string> = { checked: '✓', query: '?', none: '○' };

export const NOT_CHECKED_LABEL = 'Not checked yet';
