'use client';

import dynamic from 'next/dynamic';
import { useCallback, useState } from 'react';
import { CommentPins, type PinView } from '@/components/comments/comment-pins';
import { useComments } from '@/components/comments/comments-context';
import { useElementSize } from '@/components/editor/use-element-size';
import type { CanvasPointer } from '@/components/editor/canvas/plan-canvas';
import type { PlanDocument } from '@/lib/plan/document';
import { EMPTY_SELECTION } from '@/lib/plan/editor-state';
import type { PlanBackground } from '@/components/editor/canvas/plan-background';

const PlanCanvas = dynamic(() => import('@/components/editor/canvas/plan-canvas'), { ssr: false, loading: () => <p className="p-4 text-sm text-graphite-500">Loading the plan…</p> });

interface FrozenCanvasProps {
  document: PlanDocument;
  metresPerPixel: number;
  background: PlanBackground | null;
}

const NO_POINTS: never[] = [];

// The revision's plan, read-only, with the comment pins over it; clicking places a pin.
export function FrozenCanvas({ document, metresPerPixel, background }: FrozenCanvasProps) {
  const [area, size] = useElementSize<HTMLDivElement>();
  const [view, setView] = useState<PinView | null>(null);
  const { placing, placeAt } = useComments();
  const onPointer = useCallback((pointer: CanvasPointer) => {
    if (pointer.type === 'down' && placing) placeAt(pointer.point.x, pointer.point.y);
  }, [placing, placeAt]);
  const onViewChange = useCallback((next: PinView) => setView({ scale: next.scale, offsetX: next.offsetX, offsetY: next.offsetY }), []);
  return (
    <div ref={area} data-testid="plan-canvas" className={`panel relative h-[480px] overflow-hidden ${placing ? 'ring-2 ring-select' : ''}`}>
      {size.width > 0 && (
        <PlanCanvas
          document={document} widthPx={size.width} heightPx={size.height} background={background} grid={{ spacingPx: 50, origin: document.gridOrigin ?? null }} metresPerPixel={metresPerPixel}
          selection={EMPTY_SELECTION} editable={false} panning={false} mainPath={NO_POINTS} mode={null} preview={null} calibration={NO_POINTS}
          onPointer={onPointer} onNodeDrag={() => undefined} onViewChange={onViewChange}
        />
      )}
      <CommentPins view={view} />
    </div>
  );
}
