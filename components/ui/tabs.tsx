'use client';

import { useId, useRef, type KeyboardEvent, type ReactNode } from 'react';

export interface TabItem<K extends string> {
  key: K;
  label: ReactNode;
}

// ARIA tabs: arrow keys move between tabs, only the active one is in the tab order.
export function Tabs<K extends string>({ items, active, onChange, label, children }: { items: TabItem<K>[]; active: K; onChange: (key: K) => void; label: string; children: ReactNode }) {
  const base = useId();
  const refs = useRef<Record<string, HTMLButtonElement | null>>({});
  const onKeyDown = (event: KeyboardEvent) => {
    const i = items.findIndex((t) => t.key === active);
    const next = event.key === 'ArrowRight' ? i + 1 : event.key === 'ArrowLeft' ? i - 1 : event.key === 'Home' ? 0 : event.key === 'End' ? items.length - 1 : null;
    if (next === null) return;
    event.preventDefault();
    const item = items[(next + items.length) % items.length]!;
    onChange(item.key);
    refs.current[item.key]?.focus();
  };
  return (
    <div>
      <div role="tablist" aria-label={label} className="flex gap-1 border-b border-paper-edge" onKeyDown={onKeyDown}>
        {items.map((t) => (
          <button
            key={t.key}
            ref={(el) => {
              refs.current[t.key] = el;
            }}
            type="button"
            role="tab"
            id={`${base}-tab-${t.key}`}
            aria-selected={t.key === active}
            aria-controls={`${base}-panel`}
            tabIndex={t.key === active ? 0 : -1}
            onClick={() => onChange(t.key)}
            className={`-mb-px rounded-t-md border px-3 py-1.5 text-sm ${t.key === active ? 'border-paper-edge border-b-white bg-white font-medium' : 'border-transparent text-ink-soft hover:text-ink'}`}
          >
            {t.label}
          </button>
        ))}
      </div>
      <div role="tabpanel" id={`${base}-panel`} aria-labelledby={`${base}-tab-${active}`} className="pt-3">
        {children}
      </div>
    </div>
  );
}
