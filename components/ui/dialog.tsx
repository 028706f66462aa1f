'use client';

import { useEffect, useId, useRef, type ReactNode } from 'react';

// The native modal <dialog>: focus is trapped and Escape closes it without extra code.
export function Dialog({
  open,
  title,
  onClose,
  children,
  dismissable = true,
  wide = false,
}: {
  open: boolean;
  title: string;
  onClose: () => void;
  children: ReactNode;
  /** false for choices that must be made (Escape does nothing) */
  dismissable?: boolean;
  /** for a whole flow rather than a question: wider, and scrolls within the window */
  wide?: boolean;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(event) => {
        event.preventDefault();
        if (dismissable) onClose();
      }}
      className={`m-auto w-full ${wide ? 'max-h-[90vh] max-w-4xl overflow-y-auto' : 'max-w-md'} rounded-lg border border-paper-edge bg-white p-0 text-ink shadow-xl backdrop:bg-ink/30`}
    >
      {open ? (
        <div className="flex flex-col gap-3 p-5">
          <h2 id={titleId} className="text-base font-semibold">
            {title}
          </h2>
          {children}
        </div>
      ) : null}
    </dialog>
  );
}
