'use client';

import { useComments } from './comments-context';

export interface PinView { scale: number; offsetX: number; offsetY: number }

// Comment pins over the plan canvas, following its pan and zoom (screen = plan × scale +
// offset). Place it inside the canvas's positioned container, above the canvas.
export function CommentPins({ view }: { view: PinView | null }) {
  const { threads, activeId, setActiveId, draft } = useComments();
  if (!view) return null;
  const pinned = threads.filter((thread) => thread.xPx !== null && thread.yPx !== null);
  return (
    <div className="pointer-events-none absolute inset-0 overflow-hidden" aria-label="Comment pins">
      {pinned.map((thread) => {
        const index = threads.indexOf(thread);
        const left = thread.xPx! * view.scale + view.offsetX;
        const top = thread.yPx! * view.scale + view.offsetY;
        const active = thread.id === activeId;
        return (
          <button
            key={thread.id}
            type="button"
            data-testid="comment-pin"
            aria-label={`Comment ${index + 1} by ${thread.authorName}${thread.resolved ? ' (closed out)' : ''}`}
            onClick={() => setActiveId(active ? null : thread.id)}
            style={{ left, top }}
            className={`pointer-events-auto absolute -translate-x-1/2 -translate-y-full rounded-full rounded-bl-none border px-1.5 py-0.5 text-xs font-semibold shadow ${
              thread.resolved ? 'border-graphite-200 bg-paper-sunk text-graphite-500' : active ? 'border-select bg-select text-paper' : 'border-select bg-paper-raised text-select-ink'
            }`}
          >
            {thread.resolved ? '✓' : index + 1}
          </button>
        );
      })}
      {draft?.kind === 'pin' && (
        <span
          aria-hidden="true"
          style={{ left: draft.xPx * view.scale + view.offsetX, top: draft.yPx * view.scale + view.offsetY }}
          className="absolute -translate-x-1/2 -translate-y-full rounded-full rounded-bl-none border border-dashed border-select bg-select-soft px-1.5 py-0.5 text-xs text-select-ink"
        >
          new
        </span>
      )}
    </div>
  );
}
