// The states of a revision, with the words shown for each (never colour alone).
export const REVISION_STATES = ['waiting', 'approved', 'returned', 'replaced'] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

export const REVISION_STATE_LABELS: Record<RevisionState, string> = {
  waiting: 'Waiting for review',
  approved: 'Approved',
  returned: 'Returned: changes requested',
  replaced: 'Replaced by a later revision',
};

export function isRevisionState(value: string): value is RevisionState {
  return (REVISION_STATES as readonly string[]).includes(value);
}

export function revisionStateLabel(state: string): string {
  return isRevisionState(state) ? REVISION_STATE_LABELS[state] : state;
}
