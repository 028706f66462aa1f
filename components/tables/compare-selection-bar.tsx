'use client';

import { Button } from '../ui/button';
import { MAX_COMPARE, MIN_COMPARE } from '@/lib/schemas/compare';

export interface SelectedRoute {
  id: number;
  name: string;
}

/** What the bar says about the ticked routes, and whether they can be compared as they are. */
export function selectionState(count: number): { canCompare: boolean; hint: string; tone: 'plain' | 'caution' } {
  if (count > MAX_COMPARE) {
    const extra = count - MAX_COMPARE;
    return { canCompare: false, tone: 'caution', hint: `Compare at most ${MAX_COMPARE} routes at once: untick ${extra} of them.` };
  }
  if (count < MIN_COMPARE) {
    return { canCompare: false, tone: 'plain', hint: count === 0 ? `Tick ${MIN_COMPARE} to ${MAX_COMPARE} routes to put them side by side.` : 'Tick at least one more route to compare.' };
  }
  return { canCompare: true, tone: 'plain', hint: 'Ready to compare, in the order ticked.' };
}

// Ticked routes stay ticked across pages and searches, so alternatives on different pages can be compared.
export function CompareSelectionBar({ selected, onCompare, onUntick, onClear }: { selected: SelectedRoute[]; onCompare: () => void; onUntick: (id: number) => void; onClear: () => void }) {
  const { canCompare, hint, tone } = selectionState(selected.length);
  return (
    <section aria-label="Routes to compare" className="flex flex-wrap items-center gap-2 rounded-lg border border-paper-edge bg-white px-3 py-2 text-sm">
      <Button variant={canCompare ? 'primary' : 'secondary'} disabled={!canCompare} onClick={onCompare}>
        Compare selected ({selected.length})
      </Button>
      {selected.length ? (
        <ul className="flex flex-wrap gap-1" aria-label="Ticked routes">
          {selected.map((route) => (
            <li key={route.id} className="inline-flex items-center gap-1 rounded bg-paper-deep px-1.5 py-0.5 text-xs text-ink-soft">
              {route.name}
              <button type="button" className="text-ink-faint hover:text-ink" aria-label={`Untick ${route.name}`} onClick={() => onUntick(route.id)}>
                ×
              </button>
            </li>
          ))}
        </ul>
      ) : null}
      <p aria-live="polite" className={tone === 'caution' ? 'rounded bg-brass-100 px-1.5 font-medium text-brass-700' : 'text-ink-faint'}>
        {hint}
      </p>
      {selected.length ? (
        <Button variant="quiet" onClick={onClear}>
          Clear ticks
        </Button>
      ) : null}
    </section>
  );
}
