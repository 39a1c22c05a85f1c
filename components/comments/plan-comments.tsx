'use client';

import type { ReactNode } from 'react';
import { CommentPins, type PinView } from './comment-pins';
import { CommentsPanel } from './comments-panel';
import { CommentsProvider, useComments } from './comments-context';

export { CommentPins, CommentsPanel, CommentsProvider, useComments };

// For the plan editor: wrap the editor area in <PlanComments …>, put <CommentPins view={view} />
// inside the canvas container (position: relative), <CommentsPanel /> in a side panel, and
// call useComments().placeAt(x, y) from the canvas pointer handler while useComments().placing.
export function PlanComments({ planId, canWrite, members, children }: { planId: string; canWrite: boolean; members: string[]; children: ReactNode }) {
  return <CommentsProvider planId={planId} canWrite={canWrite} members={members}>{children}</CommentsProvider>;
}

export type { PinView };
