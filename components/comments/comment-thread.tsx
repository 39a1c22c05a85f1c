'use client';

import { useEffect, useRef, useState } from 'react';
import { describePinPlace, type PinPlaceContext } from '@/lib/comments/pin-place';
import type { CommentThread as Thread } from '@/lib/comments/types';
import { CommentForm } from './comment-form';
import { useComments } from './comments-context';

function where(thread: Thread, index: number, place: PinPlaceContext | null): string {
  if (thread.xPx !== null && thread.yPx !== null) {
    if (!place) return `Pin ${index + 1}`;
    const described = describePinPlace({ x: thread.xPx, y: thread.yPx }, place);
    return `Pin ${index + 1}, ${described.near ?? described.position}`;
  }
  if (thread.target?.startsWith('resonance:')) return `Resonance row, order ${thread.target.split(':').at(-1)}`;
  return thread.target ? 'Table row' : 'Plan';
}

// One thread: the first comment, its answers, and answer / close out / reopen.
export function CommentThreadView({ thread, index, place = null }: { thread: Thread; index: number; place?: PinPlaceContext | null }) {
  const { canWrite, members, activeId, setActiveId, send, setResolved } = useComments();
  const [answering, setAnswering] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const ref = useRef<HTMLElement>(null);
  const active = activeId === thread.id;
  useEffect(() => { if (active) ref.current?.scrollIntoView({ block: 'nearest' }); }, [active]);
  const toggle = async () => setError(await setResolved(thread.id, !thread.resolved));
  return (
    <article ref={ref} id={`comment-${thread.id}`} data-testid="comment-thread" aria-current={active ? 'true' : undefined}
      className={`rounded border p-3 text-sm ${active ? 'border-select bg-select-soft' : 'border-graphite-100 bg-paper-raised'}`} onClick={() => setActiveId(thread.id)}>
      <p className="mb-1 text-xs text-graphite-500">
        <span data-testid="pin-place" title={place && thread.xPx !== null && thread.yPx !== null ? describePinPlace({ x: thread.xPx, y: thread.yPx }, place).position : undefined}>{where(thread, index, place)}</span> · {thread.authorName} · {thread.createdAt.slice(0, 16).replace('T', ' ')}
        {thread.resolved && <span className="ml-1 font-medium text-graphite">· ✓ Closed out{thread.resolvedByName ? ` by ${thread.resolvedByName}` : ''}</span>}
      </p>
      <p className="whitespace-pre-wrap">{thread.body}</p>
      {thread.answers.map((answer) => (
        <div key={answer.id} className="mt-2 border-l-2 border-graphite-100 pl-2">
          <p className="text-xs text-graphite-500">{answer.authorName} · {answer.createdAt.slice(0, 16).replace('T', ' ')}</p>
          <p className="whitespace-pre-wrap">{answer.body}</p>
        </div>
      ))}
      {error && <p role="alert" className="field-error">{error}</p>}
      {canWrite && (
        <div className="mt-2 flex gap-2">
          {!answering && <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setAnswering(true)}>Answer</button>}
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={toggle}>{thread.resolved ? 'Reopen' : 'Close out'}</button>
        </div>
      )}
      {answering && (
        <div className="mt-2">
          <CommentForm label="Your answer" submitLabel="Send answer" members={members}
            onSend={async (body) => { const problem = await send({ body, parentId: thread.id }); if (!problem) setAnswering(false); return problem; }}
            onCancel={() => setAnswering(false)} />
        </div>
      )}
    </article>
  );
}
