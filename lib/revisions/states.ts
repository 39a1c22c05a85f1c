// The states of a revision, with the words shown for each (never colour alone). A finished review
// stamps one of the outcomes engineers stamp on a returned submittal; a revision still waiting is
// superseded when a newer one is submitted.
export const REVIEW_OUTCOMES = ['accepted', 'accepted_with_notes', 'revise_resubmit', 'rejected'] as const;
export type ReviewOutcome = (typeof REVIEW_OUTCOMES)[number];

export const REVISION_STATES = ['waiting', ...REVIEW_OUTCOMES, 'replaced'] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

export const REVISION_STATE_LABELS: Record<RevisionState, string> = {
  waiting: 'Waiting for review',
  accepted: 'Accepted',
  accepted_with_notes: 'Accepted with the notes made',
  revise_resubmit: 'Revise and resubmit',
  rejected: 'Rejected',
  replaced: 'Superseded by a later revision',
};

/** What each outcome asks of the acoustician, said once wherever the outcome is chosen or announced. */
export const OUTCOME_MEANINGS: Record<ReviewOutcome, string> = {
  accepted: 'Every row is checked and nothing needs to change: the schedule may be issued from this revision.',
  accepted_with_notes: 'The schedule may be issued from this revision; make the changes in the notes and queries in the next revision.',
  revise_resubmit: 'Change the plan as the queries and notes say and submit a new revision for review.',
  rejected: 'The approach does not work as submitted: rethink it before submitting again.',
};

export function isRevisionState(value: string): value is RevisionState {
  return (REVISION_STATES as readonly string[]).includes(value);
}

export function isReviewOutcome(value: string): value is ReviewOutcome {
  return (REVIEW_OUTCOMES as readonly string[]).includes(value);
}

export function revisionStateLabel(state: string): string {
  return isRevisionState(state) ? REVISION_STATE_LABELS[state] : state;
}

/** A revision a schedule may be issued from without the draft mark: accepted, with or without notes. */
export function isAcceptedForIssue(state: string): boolean {
  return state === 'accepted' || state === 'accepted_with_notes';
}
