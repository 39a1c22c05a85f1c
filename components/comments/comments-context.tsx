'use client';

import { useQuery, useQueryClient } from '@tanstack/react-query';
import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import { apiFetch } from '@/components/api-fetch';
import type { CommentThread } from '@/lib/comments/types';

// Where a new comment goes: a point of the plan (plan pixels).
export type CommentDraft = { kind: 'pin'; xPx: number; yPx: number };

export interface CommentsState {
  planId: string;
  revisionId: string | null;
  canWrite: boolean;
  members: string[];
  threads: CommentThread[];
  loading: boolean;
  error: string | null;
  activeId: string | null;
  setActiveId: (id: string | null) => void;
  placing: boolean;
  setPlacing: (placing: boolean) => void;
  draft: CommentDraft | null;
  setDraft: (draft: CommentDraft | null) => void;
  // Called with a plan point when the person clicks the plan while placing a pin.
  placeAt: (xPx: number, yPx: number) => void;
  send: (body: { body: string; parentId?: string | null }) => Promise<string | null>;
  setResolved: (commentId: string, resolved: boolean) => Promise<string | null>;
}

const CommentsContext = createContext<CommentsState | null>(null);

export function useComments(): CommentsState {
  const state = useContext(CommentsContext);
  if (!state) throw new Error('useComments needs a <CommentsProvider> around it');
  return state;
}

interface ProviderProps { planId: string; revisionId?: string | null; canWrite: boolean; members: string[]; initialActiveId?: string | null; children: ReactNode }

// Loads a plan's comment threads and holds what the pins and the panel share.
export function CommentsProvider({ planId, revisionId = null, canWrite, members, initialActiveId = null, children }: ProviderProps) {
  const client = useQueryClient();
  const key = useMemo(() => ['comments', planId, revisionId], [planId, revisionId]);
  const query = useQuery({
    queryKey: key,
    queryFn: async () => {
      const answer = await apiFetch<{ threads: CommentThread[] }>(`/api/v1/comments?planId=${planId}${revisionId ? `&revisionId=${revisionId}` : ''}`);
      if (!answer.ok) throw new Error(answer.error.message);
      return answer.data.threads;
    },
  });
  const [activeId, setActiveId] = useState<string | null>(initialActiveId);
  const [placing, setPlacing] = useState(false);
  const [draft, setDraft] = useState<CommentDraft | null>(null);

  const placeAt = useCallback((xPx: number, yPx: number) => {
    setDraft({ kind: 'pin', xPx, yPx });
    setPlacing(false);
  }, []);

  const send = useCallback(async ({ body, parentId = null }: { body: string; parentId?: string | null }) => {
    const place = parentId || !draft ? {} : { xPx: draft.xPx, yPx: draft.yPx };
    const answer = await apiFetch<{ comment: { id: string } }>('/api/v1/comments', { method: 'POST', body: { planId, revisionId, parentId, body, ...place } });
    if (!answer.ok) return answer.error.message;
    if (!parentId) { setDraft(null); setActiveId(answer.data.comment.id); }
    await client.invalidateQueries({ queryKey: key });
    return null;
  }, [client, draft, key, planId, revisionId]);

  const setResolved = useCallback(async (commentId: string, resolved: boolean) => {
    const answer = await apiFetch(`/api/v1/comments/${commentId}`, { method: 'PATCH', body: { resolved } });
    if (!answer.ok) return answer.error.message;
    await client.invalidateQueries({ queryKey: key });
    return null;
  }, [client, key]);

  const value: CommentsState = {
    planId, revisionId, canWrite, members, threads: query.data ?? [], loading: query.isLoading, error: query.error ? query.error.message : null,
    activeId, setActiveId, placing, setPlacing, draft, setDraft, placeAt, send, setResolved,
  };
  return <CommentsContext.Provider value={value}>{children}</CommentsContext.Provider>;
}
