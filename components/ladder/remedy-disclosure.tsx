'use client';
// A "more" button that shows or hides what follows it: a real button with aria-expanded and aria-controls, so it is
// reached with Tab and worked with Enter or Space, and the hidden part stays out of the reading order until opened.
import { useId, useState, type ReactNode } from 'react';

export function RemedyDisclosure({ label, openLabel, children, className = '' }: { label: string; openLabel?: string; children: ReactNode; className?: string }) {
  const [isOpen, setOpen] = useState(false);
  const id = useId();
  return (
    <div className={className}>
      <button
        type="button"
        aria-expanded={isOpen}
        aria-controls={id}
        onClick={() => setOpen((v) => !v)}
        className="rounded text-sm text-pine-700 underline-offset-2 hover:underline focus-visible:outline focus-visible:outline-2 focus-visible:outline-brass-500"
      >
        <span aria-hidden="true">{isOpen ? '▾ ' : '▸ '}</span>
        {isOpen ? (openLabel ?? 'Show less') : label}
      </button>
      <div id={id} hidden={!isOpen} className="mt-2">
        {isOpen ? children : null}
      </div>
    </div>
  );
}
