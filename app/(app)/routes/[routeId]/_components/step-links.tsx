'use client';

import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { equationSpecies, sameSpecies } from '@/lib/route-editor/equation-species';
import type { LinkInput, StepInput } from '@/lib/schemas/route';

// The links of one step as a list, with a keyboard way to add one: the canvas is not the only way in.
export function StepLinks({
  step,
  steps,
  links,
  stepLabels,
  canEdit,
  onAddLink,
  onRemoveLink,
}: {
  step: StepInput;
  steps: Pick<StepInput, 'id' | 'equation'>[];
  links: LinkInput[];
  stepLabels: Record<string, string>;
  canEdit: boolean;
  onAddLink: (link: LinkInput) => void;
  onRemoveLink: (link: LinkInput) => void;
}) {
  const selectId = useId();
  const [choice, setChoice] = useState('');
  const mine = links.filter((l) => l.from === step.id || l.to === step.id);
  const products = equationSpecies(step.equation).products;
  const options = steps.flatMap((other) =>
    other.id === step.id
      ? []
      : products
          .filter((p) => equationSpecies(other.equation).reactants.some((r) => sameSpecies(r, p)))
          .filter((p) => !links.some((l) => l.from === step.id && l.to === other.id && l.species === p))
          .map((p) => ({ value: JSON.stringify({ from: step.id, to: other.id, species: p }), label: `${p} → ${stepLabels[other.id] ?? other.id}` })),
  );

  return (
    <section aria-labelledby={`${selectId}-heading`} className="flex flex-col gap-1.5">
      <h3 id={`${selectId}-heading`} className="text-xs font-semibold uppercase tracking-wide text-ink-faint">
        Links
      </h3>
      {mine.length === 0 ? <p className="text-xs text-ink-faint">Not linked to another step.</p> : null}
      <ul className="flex flex-col gap-1 text-xs">
        {mine.map((link) => (
          <li key={`${link.from}>${link.to}:${link.species}`} className="flex items-center justify-between gap-2">
            <span>
              {link.from === step.id ? 'feeds' : 'fed by'} <span className="font-mono">{link.species}</span> {link.from === step.id ? 'to' : 'from'}{' '}
              {stepLabels[link.from === step.id ? link.to : link.from]}
            </span>
            {canEdit ? (
              <button type="button" className="text-uphill underline" onClick={() => onRemoveLink(link)} aria-label={`Remove link ${link.species} ${stepLabels[link.from]} to ${stepLabels[link.to]}`}>
                Remove
              </button>
            ) : null}
          </li>
        ))}
      </ul>
      {canEdit && options.length > 0 ? (
        <div className="flex items-end gap-1.5">
          <div className="flex flex-1 flex-col gap-0.5">
            <label htmlFor={selectId} className="text-xs text-ink-soft">
              Feed a product to a later step
            </label>
            <select id={selectId} value={choice} onChange={(e) => setChoice(e.target.value)} className="rounded-md border border-paper-edge bg-white px-1.5 py-1 text-xs">
              <option value="">Choose…</option>
              {options.map((o) => (
                <option key={o.value} value={o.value}>
                  {o.label}
                </option>
              ))}
            </select>
          </div>
          <Button
            variant="secondary"
            disabled={!choice}
            onClick={() => {
              onAddLink(JSON.parse(choice) as LinkInput);
              setChoice('');
            }}
          >
            Link
          </Button>
        </div>
      ) : null}
    </section>
  );
}
