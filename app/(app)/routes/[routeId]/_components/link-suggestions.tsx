'use client';

import { memo, useMemo, useState } from 'react';
import { FormulaText } from '@/components/chemistry/formula-text';
import { Button } from '@/components/ui/button';
import { suggestLinks } from '@/lib/route-editor/link-rules';
import { stepLabels } from '@/lib/route-editor/step-label';
import { useRouteEditorStore } from '@/stores/route-editor-store';

const split = (key: string) =>
  key
    .split('\u0001')
    .filter(Boolean)
    .map((entry) => entry.split('\u0000'));

// Where a step makes what the next one needs, the board offers those links in one click instead of a drag each.
// Strings from the store, so a drag frame does not recompute; "Not now" hides this set until it changes.
export const LinkSuggestions = memo(function LinkSuggestions() {
  const stepsKey = useRouteEditorStore((s) => s.doc.steps.map((x) => `${x.id}\u0000${x.equation}`).join('\u0001'));
  const linksKey = useRouteEditorStore((s) => s.doc.links.map((l) => `${l.from}\u0000${l.to}\u0000${l.species}`).join('\u0001'));
  const addLinks = useRouteEditorStore((s) => s.addLinks);
  const [dismissed, setDismissed] = useState<string | null>(null);

  const { suggestions, titles } = useMemo(() => {
    const steps = split(stepsKey).map(([id = '', equation = '']) => ({ id, equation }));
    const links = split(linksKey).map(([from = '', to = '', species = '']) => ({ from, to, species }));
    const labels = stepLabels(steps, links);
    return { suggestions: suggestLinks({ steps, links }), titles: labels };
  }, [stepsKey, linksKey]);
  const key = suggestions.map((l) => `${l.from}>${l.to}:${l.species}`).join('|');
  if (suggestions.length === 0 || dismissed === key) return null;

  const count = suggestions.length === 1 ? 'this link' : `these ${suggestions.length} links`;
  return (
    <section
      aria-label="Suggested links"
      className="pointer-events-auto absolute bottom-2 right-2 z-10 max-w-[26rem] rounded-md border border-pine-500/40 bg-white/95 px-3 py-2 text-xs shadow"
      data-testid="link-suggestions"
    >
      <p className="font-medium text-ink">These steps make what the next ones need:</p>
      <ul className="my-1 flex flex-col gap-0.5 text-ink-soft">
        {suggestions.map((l) => (
          <li key={`${l.from}>${l.to}:${l.species}`}>
            <FormulaText value={l.species} /> from {titles.get(l.from)?.short} to {titles.get(l.to)?.short}
          </li>
        ))}
      </ul>
      <div className="flex gap-1.5">
        <Button className="px-2 py-1 text-xs" onClick={() => addLinks(suggestions)}>
          Make {count}
        </Button>
        <Button variant="quiet" className="px-2 py-1 text-xs" onClick={() => setDismissed(key)}>
          Not now
        </Button>
      </div>
    </section>
  );
});
