'use client';

import { CommentsPanel } from '@/components/comments/comments-panel';
import { CommentsProvider, useComments } from '@/components/comments/comments-context';
import { Providers } from '@/components/providers';
import type { PlanDocument } from '@/lib/plan/document';
import type { RunResult } from '@/lib/plans/results';
import type { RiskRow } from '@/lib/revisions/types';
import { FrozenCanvas } from './frozen-canvas';
import { ReviewTable } from './review-table';
import type { RowDecisionState } from './row-decision';

interface RevisionWorkspaceProps {
  planId: string;
  revisionId: string;
  document: PlanDocument;
  metresPerPixel: number;
  background: { url: string; widthPx: number; heightPx: number } | null;
  runs: RunResult[];
  risks: readonly RiskRow[];
  decisions: Record<string, RowDecisionState>;
  canReview: boolean;
  canComment: boolean;
  members: string[];
  focusCommentId: string | null;
}

function Tables(props: Pick<RevisionWorkspaceProps, 'revisionId' | 'runs' | 'risks' | 'decisions' | 'canReview' | 'canComment'>) {
  const { setDraft } = useComments();
  return (
    <ReviewTable revisionId={props.revisionId} runs={props.runs} risks={props.risks} decisions={props.decisions} canReview={props.canReview}
      onCommentRow={props.canComment ? (target, label) => setDraft({ kind: 'row', target, label }) : undefined} />
  );
}

// The revision page's working area: the frozen plan with pins, comments beside it, and the
// resonance tables with their review below.
export function RevisionWorkspace(props: RevisionWorkspaceProps) {
  return (
    <Providers>
    <CommentsProvider planId={props.planId} revisionId={props.revisionId} canWrite={props.canComment} members={props.members} initialActiveId={props.focusCommentId}>
      <div className="grid gap-4 lg:grid-cols-[1fr_22rem]">
        <FrozenCanvas document={props.document} metresPerPixel={props.metresPerPixel} background={props.background} />
        <aside className="max-h-[480px] overflow-y-auto"><CommentsPanel /></aside>
      </div>
      <h2 className="mt-6 mb-2 text-lg font-semibold">Resonances and review</h2>
      <Tables {...props} />
    </CommentsProvider>
    </Providers>
  );
}
