'use client';

// "Add species" under the equation: search by name, formula, CAS number or InChIKey, choose the side and the phase,
// and the pick goes into the equation (a library key as written, or a short label bound to the structure).
import { useId, useState } from 'react';
import { SpeciesCombobox } from '@/components/chemistry/species-combobox';
import type { SpeciesSearchHit } from '@/lib/queries/species-search';
import type { StepInput } from '@/lib/schemas/route';
import { addTerm, defaultPhase, insertionFor, PHASE_WORDS, type Phase, type Side } from './species-insert';

const MAX_EQUATION = 500;
const SELECT = 'rounded-md border border-paper-edge bg-white px-1.5 py-1 text-xs outline-none focus:border-pine-500 focus:ring-2 focus:ring-pine-100';

export function AddSpecies({
  equation,
  species,
  canEdit,
  onAdd,
}: {
  equation: string;
  species: StepInput['species'];
  canEdit: boolean;
  onAdd: (next: { equation: string; species: StepInput['species'] }) => void;
}) {
  const id = useId();
  const [side, setSide] = useState<Side>('reactants');
  const [phase, setPhase] = useState<Phase | 'auto'>('auto');
  const [said, setSaid] = useState<{ text: string; isError: boolean } | null>(null);

  function handlePick(hit: SpeciesSearchHit) {
    const chosen = phase === 'auto' ? defaultPhase(hit) : phase;
    const insertion = insertionFor(hit, chosen, species, equation);
    const next = addTerm(equation, side, insertion.term);
    if (next.length > MAX_EQUATION) {
      setSaid({ text: `The equation would pass ${MAX_EQUATION} characters; ${hit.name} was not added.`, isError: true });
      return;
    }
    onAdd({ equation: next, species: insertion.species });
    const data = hit.phases.some((p) => p.phase === chosen) ? '' : ' (no data in that phase: it will be estimated)';
    setSaid({ text: `Added ${hit.name}, ${PHASE_WORDS[chosen]}, to the ${side === 'reactants' ? 'reactants' : 'products'} as ${insertion.term}${data}.`, isError: false });
  }

  if (!canEdit) return null;
  return (
    <div className="flex flex-col gap-1.5 rounded-md border border-dashed border-paper-edge px-2 py-1.5" data-testid="add-species">
      <SpeciesCombobox label="Add species" onPick={handlePick} />
      <div className="flex flex-wrap items-center gap-2 text-xs">
        <fieldset className="flex items-center gap-2">
          <legend className="sr-only">Add to</legend>
          {(['reactants', 'products'] as const).map((s) => (
            <label key={s} className="flex items-center gap-1">
              <input type="radio" name={`${id}-side`} value={s} checked={side === s} onChange={() => setSide(s)} className="accent-pine-600" />
              {s === 'reactants' ? 'Reactant' : 'Product'}
            </label>
          ))}
        </fieldset>
        <label className="flex items-center gap-1">
          Phase
          <select value={phase} onChange={(e) => setPhase(e.target.value as Phase | 'auto')} className={SELECT}>
            <option value="auto">with data (liquid first)</option>
            {(Object.keys(PHASE_WORDS) as Phase[]).map((p) => (
              <option key={p} value={p}>
                {PHASE_WORDS[p]} ({p})
              </option>
            ))}
          </select>
        </label>
      </div>
      <p aria-live="polite" className={`text-[11px] ${said?.isError ? 'text-uphill' : 'text-ink-faint'}`}>
        {said?.text ?? ''}
      </p>
    </div>
  );
}
