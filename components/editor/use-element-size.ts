'use client';

import { useCallback, useState } from 'react';

// The size of an element, kept up to date with a ResizeObserver.
export function useElementSize<T extends HTMLElement>(): [(element: T | null) => void, { width: number; height: number }] {
  const [size, setSize] = useState({ width: 0, height: 0 });
  const ref = useCallback((element: T | null) => {
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => {
      const { width, height } = entry.contentRect;
      setSize((current) => (current.width === Math.floor(width) && current.height === Math.floor(height) ? current : { width: Math.floor(width), height: Math.floor(height) }));
    });
    observer.observe(element);
  }, []);
  return [ref, size];
}
