'use client';

// A DXF drawing's stored paths, fetched once per URL however many components ask (the canvas and the
// layers list); an upload never changes, so what was fetched stays good.
import { useEffect, useState } from 'react';
import type { DxfDrawing } from '@/lib/dxf/drawing';

const fetched = new Map<string, Promise<DxfDrawing>>();

function drawingAt(url: string): Promise<DxfDrawing> {
  let pending = fetched.get(url);
  if (!pending) {
    pending = fetch(url).then(async (response) => {
      if (!response.ok) throw new Error(`The drawing could not be fetched (${response.status}).`);
      return (await response.json()) as DxfDrawing;
    });
    pending.catch(() => fetched.delete(url));
    fetched.set(url, pending);
  }
  return pending;
}

export function useDxfDrawing(url: string | null): { drawing: DxfDrawing | null; error: string | null } {
  const [state, setState] = useState<{ url: string | null; drawing: DxfDrawing | null; error: string | null }>({ url: null, drawing: null, error: null });
  useEffect(() => {
    if (!url) return;
    let current = true;
    drawingAt(url).then(
      (drawing) => { if (current) setState({ url, drawing, error: null }); },
      (error: unknown) => { if (current) setState({ url, drawing: null, error: error instanceof Error ? error.message : String(error) }); },
    );
    return () => { current = false; };
  }, [url]);
  return state.url === url && url ? { drawing: state.drawing, error: state.error } : { drawing: null, error: null };
}
