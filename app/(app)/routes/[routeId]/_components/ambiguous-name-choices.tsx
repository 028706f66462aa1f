'use client';

// When a name in the equation stands for several compounds (the balance check answers AMBIGUOUS_NAME with the
// choices), the choices are offered at the field: each drawn, named, with formula, CAS and SMILES. Choosing one binds
// a label to its structure in place of the name. Reads the balance check's own query, so no request is added.
import { useQuery } from '@tanstack/react-query';
import { FormulaText } from '@/components/chemistry/formula-text';
import { StructureImage } from '@/components/chemistry/structure-image';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { balanceQuery } from '@/lib/queries/routes';
import type { StepInput } from '@/lib/schemas/route';
import { insertionFor, replaceNamed, type Phase } from './species-insert';

export interface NameChoice {
  name: string;
  smiles: string;
  formula: string;
  inchikey: string;
  cas: string | null;
}

interface AmbiguityDetails {
  name: string;
  phase: string;
  choices: NameChoice[];
}

const PHASES = new Set(['g', 'l', 's', 'aq']);

/** The choices of an AMBIGUOUS_NAME answer, or null for any other answer. */
export function ambiguityOf(answer: unknown): AmbiguityDetails | null {
  const error = (answer as { error?: { code?: string; details?: Partial<AmbiguityDetails> } } | undefined)?.error;
  const d = error?.code === 'AMBIGUOUS_NAME' ? error.details : undefined;
  if (!d || typeof d.name !== 'string' || typeof d.phase !== 'string' || !PHASES.has(d.phase) || !Array.isArray(d.choices) || d.choices.length === 0) return null;
  return { name: d.name, phase: d.phase, choices: d.choices };
}

export function AmbiguousNameChoices({
  equation,
  species,
  canEdit,
  onChoose,
}: {
  equation: string;
  species: StepInput['species'];
  canEdit: boolean;
  onChoose: (next: { equation: string; species: StepInput['species'] }) => void;
}) {
  // Same text, delay and key as the balance check above it, so both read one answer.
  const settled = useDebouncedValue(equation.trim(), 400);
  const check = useQuery({ ...balanceQuery(settled, species), enabled: settled.length > 0 });
  const ambiguity = ambiguityOf(check.data);
  if (!ambiguity || !canEdit) return null;
  const phase = ambiguity.phase as Phase;

  function handleChoose(choice: NameChoice) {
    const insertion = insertionFor({ name: choice.name, smiles: choice.smiles, phases: [] }, phase, species, equation);
    onChoose({ equation: replaceNamed(equation, ambiguity!.name, phase, insertion.term), species: insertion.species });
  }

  return (
    <section aria-label={`Compounds called ${ambiguity.name}`} className="rounded-md border border-marginal/40 bg-paper px-2 py-1.5 text-xs" data-testid="name-choices">
      <p className="font-medium text-ink">
        “{ambiguity.name}” names {ambiguity.choices.length} compounds. Choose the one you mean:
      </p>
      <ul className="mt-1 flex flex-col gap-1">
        {ambiguity.choices.map((c) => (
          <li key={c.inchikey}>
            <button
              type="button"
              onClick={() => handleChoose(c)}
              className="flex w-full items-center gap-2 rounded border border-paper-edge bg-white px-1.5 py-1 text-left hover:border-pine-500 focus:border-pine-500 focus:outline-none focus:ring-2 focus:ring-pine-100"
            >
              <StructureImage smiles={c.smiles} name={c.name} formula={c.formula} width={56} height={42} />
              <span className="min-w-0 flex-1">
                <span className="block truncate font-medium">{c.name}</span>
                <span className="block text-[11px] text-ink-soft">
                  <FormulaText value={c.formula} />
                  {c.cas ? ` · CAS ${c.cas}` : ''}
                </span>
                <span className="block truncate font-mono text-[11px] text-ink-faint" title={c.smiles}>
                  {c.smiles}
                </span>
              </span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
