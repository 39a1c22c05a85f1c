'use client';

// Which of a DXF drawing's layers are hidden on this plan: at first the layers off or frozen in the
// file, then whatever the person switches, kept in this browser per plan and drawing (localStorage).
// A view setting, like the risk drawer's height: it changes neither the plan nor its version.
import { useCallback, useEffect, useMemo, useState } from 'react';
import type { DxfDrawing } from '@/lib/dxf/drawing';

function storageKey(planId: string, url: string): string {
  return `antinode:drawing-layers:${planId}:${url}`;
}

function read(key: string): string[] | null {
  try {
    const saved = window.localStorage.getItem(key);
    const parsed: unknown = saved ? JSON.parse(saved) : null;
    return Array.isArray(parsed) && parsed.every((name) => typeof name === 'string') ? parsed : null;
  } catch {
    return null;
  }
}

function offInFile(drawing: DxfDrawing | null): string[] {
  return drawing ? drawing.layers.filter((layer) => layer.offInFile).map((layer) => layer.name) : [];
}

export function useHiddenLayers(planId: string, url: string | null, drawing: DxfDrawing | null): { hidden: ReadonlySet<string>; toggle: (name: string) => void } {
  const [hidden, setHidden] = useState<string[] | null>(null);
  useEffect(() => {
    if (!url || !drawing) { setHidden(null); return; }
    setHidden(read(storageKey(planId, url)) ?? offInFile(drawing));
  }, [planId, url, drawing]);
  const toggle = useCallback((name: string) => {
    setHidden((current) => {
      const list = current ?? offInFile(drawing);
      const next = list.includes(name) ? list.filter((other) => other !== name) : [...list, name];
      if (url) {
        try { window.localStorage.setItem(storageKey(planId, url), JSON.stringify(next)); } catch { /* private mode: kept for this visit only */ }
      }
      return next;
    });
  }, [planId, url, drawing]);
  // Until the saved choice is read, the file's own: no layer off in the file flashes on.
  const set = useMemo(() => new Set(hidden ?? offInFile(drawing)), [hidden, drawing]);
  return { hidden: set, toggle };
}
