'use client';

import { useId, useMemo, useState } from 'react';
import { Button } from '@/components/ui/button';
import { equationSpecies, sameSpecies } from '@/lib/route-editor/equation-species';
import { linkRefusal } from '@/lib/route-editor/link-rules';
import { stepLabels } from '@/lib/route-editor/step-label';
import type { LinkInput, StepInput } from '@/lib/schemas/route';

type StepRef = Pick<StepInput, 'id' | 'equation'>;

/** The step after `step` in route order that consumes `product` and is not yet fed it by this step. */
function firstTaker(step: StepRef, product: string, ordered: StepRef[], links: LinkInput[]): string {
  const after = ordered.slice(ordered.findIndex((s) => s.id === step.id) + 1);
  const takes = (s: StepRef) =>
    equationSpecies(s.equation).reactants.some((r) => sameSpecies(r, product)) && !links.some((l) => l.from === step.id && l.to === s.id && sameSpecies(l.species, product));
  return (after.find(takes) ?? ordered.find((s) => s.id !== step.id && takes(s)))?.id ?? '';
}

// Linking without a mouse: one of this step's products to a step that consumes it, through the same rules and store
// action as dragging a handle, with the refusal in words next to the button.
export function LinkProductControl({ step, steps, links, onAddLink }: { step: StepRef; steps: StepRef[]; links: LinkInput[]; onAddLink: (link: LinkInput) => void }) {
  const id = useId();
  const products = equationSpecies(step.equation).products;
  const labels = useMemo(() => stepLabels(steps, links), [steps, links]);
  const ordered = useMemo(() => [...labels.keys()].flatMap((sid) => steps.filter((s) => s.id === sid)), [labels, steps]);
  const [picked, setPicked] = useState<{ product: string; to: string } | null>(null);
  const [message, setMessage] = useState<{ text: string; isError: boolean } | null>(null);

  if (products.length === 0) return <p className="text-xs text-ink-faint">This step has no products to link yet.</p>;
  const product = picked && products.includes(picked.product) ? picked.product : (products.find((p) => firstTaker(step, p, ordered, links)) ?? products[0]!);
  const to = picked && picked.product === product && (picked.to === '' || steps.some((s) => s.id === picked.to)) ? picked.to : firstTaker(step, product, ordered, links);
  const others = ordered.filter((s) => s.id !== step.id);

  const handleLink = () => {
    if (!to) {
      setMessage({ text: 'Choose the step that consumes it.', isError: true });
      return;
    }
    const refusal = linkRefusal({ steps, links }, { from: step.id, to, fromSpecies: product, toSpecies: product });
    if (refusal) {
      setMessage({ text: refusal, isError: true });
      return;
    }
    onAddLink({ from: step.id, to, species: product });
    setMessage({ text: `Linked: ${product} from ${labels.get(step.id)?.full} to ${labels.get(to)?.full}.`, isError: false });
    setPicked(null);
  };

  return (
    <fieldset className="flex flex-col gap-1.5 rounded-md border border-paper-edge p-2">
      <legend className="px-1 text-xs font-medium text-ink-soft">Link product to…</legend>
      <div className="grid grid-cols-[auto_1fr] items-center gap-x-2 gap-y-1 text-xs">
        <label htmlFor={`${id}-product`} className="text-ink-soft">
          Product
        </label>
        <select
          id={`${id}-product`}
          value={product}
          onChange={(e) => {
            setPicked({ product: e.target.value, to: firstTaker(step, e.target.value, ordered, links) });
            setMessage(null);
          }}
          className="rounded-md border border-paper-edge bg-white px-1.5 py-1"
        >
          {products.map((p) => (
            <option key={p} value={p}>
              {p}
            </option>
          ))}
        </select>
        <label htmlFor={`${id}-to`} className="text-ink-soft">
          To step
        </label>
        <select
          id={`${id}-to`}
          value={to}
          onChange={(e) => {
            setPicked({ product, to: e.target.value });
            setMessage(null);
          }}
          className="rounded-md border border-paper-edge bg-white px-1.5 py-1"
        >
          <option value="">Choose a step…</option>
          {others.map((s) => {
            const consumes = equationSpecies(s.equation).reactants.some((r) => sameSpecies(r, product));
            return (
              <option key={s.id} value={s.id}>
                {`${labels.get(s.id)?.full ?? 'a step'}${consumes ? ' · consumes it' : ''}`}
              </option>
            );
          })}
        </select>
      </div>
      <div className="flex items-center gap-2">
        <Button variant="secondary" className="px-2 py-1 text-xs" onClick={handleLink}>
          Link
        </Button>
        <p role="status" aria-live="polite" className={`text-xs ${message?.isError ? 'text-uphill' : 'text-ink-soft'}`}>
          {message ? (message.isError ? <span aria-hidden="true">! </span> : null) : null}
          {message?.text}
        </p>
      </div>
    </fieldset>
  );
}
