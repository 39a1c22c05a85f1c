import { revisionStateLabel, type RevisionState } from '@/lib/revisions/states';

// A revision's state in words, with a shape so it never relies on colour alone.
const SHAPES: Record<RevisionState, { mark: string; tone: string }> = {
  waiting: { mark: '◷', tone: 'border-select text-select-ink bg-select-soft' },
  accepted: { mark: '✓', tone: 'border-ok text-graphite bg-ok-soft' },
  accepted_with_notes: { mark: '✓', tone: 'border-ok text-graphite bg-paper-raised' },
  revise_resubmit: { mark: '↺', tone: 'border-risk text-risk-ink bg-risk-soft' },
  rejected: { mark: '✗', tone: 'border-risk text-risk-ink bg-paper-raised' },
  replaced: { mark: '–', tone: 'border-graphite-200 text-graphite-500 bg-paper-sunk' },
};

export function RevisionStateBadge({ state }: { state: RevisionState }) {
  const shape = SHAPES[state];
  return (
    <span data-testid="revision-state" className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-2 py-0.5 text-xs font-medium ${shape.tone}`}>
      <span aria-hidden="true">{shape.mark}</span>
      {revisionStateLabel(state)}
    </span>
  );
}
