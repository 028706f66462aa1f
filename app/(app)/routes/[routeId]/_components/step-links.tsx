'use client';

import { useId } from 'react';
import { FormulaText } from '@/components/chemistry/formula-text';
import type { LinkInput, StepInput } from '@/lib/schemas/route';
import { LinkProductControl } from './link-product-control';

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
  const headingId = useId();
  const mine = links.filter((l) => l.from === step.id || l.to === step.id);
  const nameOf = (id: string) => stepLabels[id] ?? 'a removed step';

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-1.5">
      <h3 id={headingId} className="text-xs font-semibold uppercase tracking-wide text-ink-faint">
        Links
      </h3>
      {mine.length === 0 ? <p className="text-xs text-ink-faint">Not linked to another step.</p> : null}
      <ul className="flex flex-col gap-1 text-xs">
        {mine.map((link) => (
          <li key={`${link.from}>${link.to}:${link.species}`} className="flex items-center justify-between gap-2">
            <span>
              {link.from === step.id ? 'feeds' : 'fed by'} <FormulaText value={link.species} /> {link.from === step.id ? 'to' : 'from'} {nameOf(link.from === step.id ? link.to : link.from)}
            </span>
            {canEdit ? (
              <button type="button" className="text-uphill underline" onClick={() => onRemoveLink(link)} aria-label={`Remove link ${link.species} from ${nameOf(link.from)} to ${nameOf(link.to)}`}>
                Remove
              </button>
            ) : null}
          </li>
        ))}
      </ul>
      {canEdit ? <LinkProductControl key={step.id} step={step} steps={steps} links={links} onAddLink={onAddLink} /> : null}
    </section>
  );
}
