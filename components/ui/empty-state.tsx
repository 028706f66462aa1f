import type { ReactNode } from 'react';

export function EmptyState({ title, children, action }: { title: string; children: ReactNode; action?: ReactNode }) {
  return (
    <section className="rounded-lg border border-dashed border-paper-edge bg-white/60 px-6 py-10 text-center">
      <h2 className="text-base font-semibold text-ink">{title}</h2>
      <div className="mx-auto mt-2 max-w-xl text-sm text-ink-soft">{children}</div>
      {action ? <div className="mt-4 flex justify-center">{action}</div> : null}
    </section>
  );
}
