'use client';

// The risk drawer's height: dragged or set with the arrow keys on its edge, kept within bounds and
// remembered in this browser (localStorage), so it opens at the size the person left it.
import { useCallback, useEffect, useRef, useState } from 'react';

const STORAGE_KEY = 'antinode.riskDrawer.heightPx';
export const DEFAULT_DRAWER_HEIGHT_PX = 224;
export const MIN_DRAWER_HEIGHT_PX = 120;
/** At most this share of the window, so the canvas keeps room above it. */
const MAX_WINDOW_SHARE = 0.7;
const KEY_STEP_PX = 24;

function maxHeightPx(): number {
  return typeof window === 'undefined' ? 800 : Math.max(MIN_DRAWER_HEIGHT_PX, Math.round(window.innerHeight * MAX_WINDOW_SHARE));
}

export function clampDrawerHeight(heightPx: number, maxPx: number): number {
  return Math.round(Math.min(Math.max(heightPx, MIN_DRAWER_HEIGHT_PX), Math.max(MIN_DRAWER_HEIGHT_PX, maxPx)));
}

export function useDrawerHeight() {
  const [heightPx, setHeightPx] = useState(DEFAULT_DRAWER_HEIGHT_PX);
  const [maxPx, setMaxPx] = useState(800);
  const drag = useRef<{ startY: number; startHeight: number } | null>(null);

  // Read after the first render (the server knows neither the window nor the stored size).
  useEffect(() => {
    const stored = Number(window.localStorage.getItem(STORAGE_KEY));
    if (Number.isFinite(stored) && stored > 0) setHeightPx(clampDrawerHeight(stored, maxHeightPx()));
    const onResize = () => setMaxPx(maxHeightPx());
    onResize();
    window.addEventListener('resize', onResize);
    return () => window.removeEventListener('resize', onResize);
  }, []);

  const set = useCallback((next: number) => {
    const clamped = clampDrawerHeight(next, maxHeightPx());
    setHeightPx(clamped);
    try { window.localStorage.setItem(STORAGE_KEY, String(clamped)); } catch { /* private mode: the size lasts this visit */ }
  }, []);

  const onPointerDown = useCallback((event: React.PointerEvent<HTMLElement>) => {
    event.preventDefault();
    event.currentTarget.setPointerCapture(event.pointerId);
    drag.current = { startY: event.clientY, startHeight: heightPx };
  }, [heightPx]);
  const onPointerMove = useCallback((event: React.PointerEvent<HTMLElement>) => {
    if (drag.current) set(drag.current.startHeight + (drag.current.startY - event.clientY));
  }, [set]);
  const onPointerUp = useCallback(() => { drag.current = null; }, []);
  const onKeyDown = useCallback((event: React.KeyboardEvent<HTMLElement>) => {
    if (event.key === 'ArrowUp') { event.preventDefault(); set(heightPx + KEY_STEP_PX); }
    if (event.key === 'ArrowDown') { event.preventDefault(); set(heightPx - KEY_STEP_PX); }
  }, [heightPx, set]);

  return { heightPx: Math.min(heightPx, maxPx), handle: { onPointerDown, onPointerMove, onPointerUp, onKeyDown }, maxPx };
}
