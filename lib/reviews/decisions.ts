// The words for a reviewer's decision on a row (never colour alone).
export const DECISIONS = ['accepted', 'flagged'] as const;
export type Decision = (typeof DECISIONS)[number];

export const DECISION_LABELS: Record<Decision, string> = { accepted: 'Accepted', flagged: 'Flagged' };
