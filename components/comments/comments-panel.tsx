'use client';

import { describePinPlace, type PinPlaceContext } from '@/lib/comments/pin-place';
import { CommentForm } from './comment-form';
import { CommentThreadView } from './comment-thread';
import { useComments } from './comments-context';

// The side panel: place a pin, write on the chosen place, and read every thread. With `place`
// (the plan, its scale and the reader's units) pins say where they are in plan units and by the
// nearest labelled element.
export function CommentsPanel({ place = null }: { place?: PinPlaceContext | null }) {
  const { threads, loading, error, canWrite, members, placing, setPlacing, draft, setDraft, send } = useComments();
  const open = threads.filter((thread) => !thread.resolved).length;
  const draftPlace = draft && place ? describePinPlace({ x: draft.xPx, y: draft.yPx }, place) : null;
  return (
    <section aria-labelledby="comments-title" className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="comments-title" className="font-semibold">Comments <span className="text-sm font-normal text-graphite-500">({open === 0 ? 'none to close out' : `${open} to close out`})</span></h2>
        {canWrite && (
          <button type="button" className={placing ? 'btn-primary' : 'btn-quiet'} aria-pressed={placing} onClick={() => setPlacing(!placing)}>
            {placing ? 'Click the plan…' : 'Place a pin'}
          </button>
        )}
      </div>
      {placing && <p className="text-sm text-select-ink">Click the point of the plan the comment is about.</p>}
      {canWrite && draft && (
        <div className="panel p-3">
          <p className="mb-1 text-xs text-graphite-500" data-testid="draft-place">
            New pin{draftPlace ? `${draftPlace.near ? `, ${draftPlace.near}` : ''} (${draftPlace.position})` : ' on the plan'}
          </p>
          <CommentForm label="Comment" submitLabel="Post comment" members={members} onSend={(body) => send({ body })} onCancel={() => setDraft(null)} />
        </div>
      )}
      {loading && <p className="text-sm text-graphite-500">Loading comments…</p>}
      {error && <p role="alert" className="field-error">{error}</p>}
      {!loading && threads.length === 0 && (
        <p className="text-sm text-graphite-500">{canWrite ? 'No comments yet. Place a pin on the plan to ask about a point of it.' : 'No comments yet.'}</p>
      )}
      <div className="space-y-2">
        {threads.map((thread, index) => <CommentThreadView key={thread.id} thread={thread} index={index} place={place} />)}
      </div>
    </section>
  );
}
