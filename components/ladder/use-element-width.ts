'use client';
// The width of an element, kept current with a ResizeObserver; `fallback` until the first measurement
// (and on the server), so the first paint already has a sensible chart.
import { useEffect, useState } from 'react';

/** Returns a callback ref (so an element mounted later, e.g. after an empty state, is observed too) and the width. */
export function useElementWidth<T extends HTMLElement>(fallback: number): [(el: T | null) => void, number] {
  const [element, setElement] = useState<T | null>(null);
  const [width, setWidth] = useState(fallback);
  useEffect(() => {
    if (!element || typeof ResizeObserver === 'undefined') return;
    const measure = (w: number): void => {
      // Whole pixels: sub-pixel jitter would re-layout the chart for nothing.
      const next = Math.floor(w);
      if (next > 0) setWidth((prev) => (prev === next ? prev : next));
    };
    measure(element.getBoundingClientRect().width);
    const observer = new ResizeObserver((entries) => {
      const entry = entries[0];
      if (entry) measure(entry.contentRect.width);
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [element]);
  return [setElement, width];
}
