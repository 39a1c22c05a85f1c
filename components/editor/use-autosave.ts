'use client';

// Saves the document a moment after each change, with the version it was based on. A stale
// version (409) stops autosaving and leaves the choice to the person; edits stay in memory.
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, type Dispatch } from 'react';
import { apiFetch } from '@/components/api-fetch';
import type { PlanDocument } from '@/lib/plan';
import { isDirty, type EditorAction, type EditorModel } from './editor-model';

const AUTOSAVE_DELAY_MS = 500;

interface PlanResponse { plan: { version: number; document: PlanDocument; metresPerPixel: number } }

export function useAutosave(planId: string, model: EditorModel, dispatch: Dispatch<EditorAction>, enabled: boolean) {
  const queryClient = useQueryClient();
  const inFlight = useRef(false);

  const saveNow = useCallback(async (current: EditorModel) => {
    if (inFlight.current) return;
    inFlight.current = true;
    const document = current.history.present;
    const metresPerPixel = current.metresPerPixel;
    dispatch({ type: 'save-started' });
    const result = await apiFetch<{ version: number }>(`/api/v1/plans/${planId}/document`, {
      method: 'PUT',
      body: { version: current.version, metresPerPixel, document },
    });
    inFlight.current = false;
    if (result.ok) {
      dispatch({ type: 'save-succeeded', version: result.data.version, document, metresPerPixel });
      await queryClient.invalidateQueries({ queryKey: ['plan-results', planId] });
    } else if (result.status === 409) {
      dispatch({ type: 'save-conflict', message: result.error.message });
    } else {
      dispatch({ type: 'save-failed', message: `Not saved: ${result.error.message} Your edits are kept; the next change tries again.` });
    }
  }, [planId, dispatch, queryClient]);

  useEffect(() => {
    if (!enabled || model.saveStatus === 'conflict' || model.saveStatus === 'saving' || !isDirty(model)) return;
    const timer = window.setTimeout(() => { void saveNow(model); }, AUTOSAVE_DELAY_MS);
    return () => window.clearTimeout(timer);
  }, [enabled, model, saveNow]);

  // Before leaving with unsaved edits, the browser asks.
  useEffect(() => {
    const warn = (event: BeforeUnloadEvent) => { if (isDirty(model)) event.preventDefault(); };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [model]);

  const fetchLatest = useCallback(async () => apiFetch<PlanResponse>(`/api/v1/plans/${planId}`), [planId]);

  const reloadTheirs = useCallback(async () => {
    const latest = await fetchLatest();
    if (!latest.ok) { dispatch({ type: 'notice', message: latest.error.message }); return; }
    dispatch({ type: 'reload', version: latest.data.plan.version, document: latest.data.plan.document, metresPerPixel: latest.data.plan.metresPerPixel });
    await queryClient.invalidateQueries({ queryKey: ['plan-results', planId] });
  }, [fetchLatest, dispatch, queryClient, planId]);

  const overwriteWithMine = useCallback(async () => {
    const latest = await fetchLatest();
    if (!latest.ok) { dispatch({ type: 'notice', message: latest.error.message }); return; }
    dispatch({ type: 'rebase', version: latest.data.plan.version });
  }, [fetchLatest, dispatch]);

  return { reloadTheirs, overwriteWithMine };
}
