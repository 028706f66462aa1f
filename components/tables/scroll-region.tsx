'use client';

import { useEffect, useRef, useState, type ReactNode } from 'react';

/**
 * A wide table's own sideways scroller, so the page never scrolls sideways on a phone. While its content is wider
 * than it, it is a named region in the tab order, so a keyboard can scroll it too. `relative` makes it the
 * containing block of absolutely placed children (sr-only header text), which would otherwise widen the page.
 */
export function ScrollRegion({ label, className = '', children }: { label: string; className?: string; children: ReactNode }) {
  const ref = useRef<HTMLDivElement>(null);
  const [isScrollable, setScrollable] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const check = () => setScrollable(el.scrollWidth > el.clientWidth + 1);
    check();
    const observer = new ResizeObserver(check);
    observer.observe(el);
    if (el.firstElementChild) observer.observe(el.firstElementChild);
    return () => observer.disconnect();
  }, []);
  return (
    <div
      ref={ref}
      role="region"
      aria-label={label}
      tabIndex={isScrollable ? 0 : undefined}
      data-scrollable={isScrollable || undefined}
      className={`relative overflow-x-auto ${className}`}
    >
      {children}
    </div>
  );
}
