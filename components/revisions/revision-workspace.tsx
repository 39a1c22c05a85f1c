'use client';

import { CommentsPanel } from '@/components/comments/comments-panel';
import { CommentsProvider } from '@/components/comments/comments-context';
import { Providers } from '@/components/providers';
import type { PlanDocument } from '@/lib/plan/document';
import type { PlanLabels } from '@/lib/plan/labels';
import type { UnitSystem } from '@/lib/plan/units';
import type { RunResult } from '@/lib/plans/results';
import type { RiskRow } from '@/lib/revisions/types';
import { FrozenCanvas } from './frozen-canvas';
import { ReviewTable } from './review-table';
import type { RowDecisionState } from './row-decision';
import type { PlanBackground } from '@/components/editor/canvas/plan-background';

interface RevisionWorkspaceProps {
  planId: string;
  revisionId: string;
  document: PlanDocument;
  metresPerPixel: number;
  /** The frozen labels (null for revisions frozen before labels existed: derived from the document). */
  labels: PlanLabels | null;
  unitSystem: UnitSystem;
  background: PlanBackground | null;
  runs: RunResult[];
  risks: readonly RiskRow[];
  decisions: Record<string, RowDecisionState>;
  canReview: boolean;
  canComment: boolean;
  members: string[];
  focusCommentId: string | null;
}

// The revision page's working area: the frozen plan with pins, comments beside it, and the
// resonance tables with the engineer's marks below.
export function RevisionWorkspace(props: RevisionWorkspaceProps) {
  const place = { document: props.document, metresPerPixel: props.metresPerPixel, unitSystem: props.unitSystem, labels: props.labels };
  return (
    <Providers>
    <CommentsProvider planId={props.planId} revisionId={props.revisionId} canWrite={props.canComment} members={props.members} initialActiveId={props.focusCommentId}>
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <FrozenCanvas document={props.document} metresPerPixel={props.metresPerPixel} background={props.background} />
        <aside className="max-h-[480px] overflow-y-auto pr-1"><CommentsPanel place={place} /></aside>
      </div>
      <h2 className="mt-6 mb-2 text-lg font-semibold">Resonances and risk flags: check each row</h2>
      <ReviewTable revisionId={props.revisionId} runs={props.runs} risks={props.risks} decisions={props.decisions} canReview={props.canReview} />
    </CommentsProvider>
    </Providers>
  );
}
