// Where a species made (or found) in the "new species from a structure" dialog goes on the board: the step that
// asked for it, where that step wrote the missing species, or a side of the selected step the user chooses. Uses the
// same insertion as the Add species search (species-insert.ts): a short label bound to the structure. Pure, for the
// unit tests.
import type { StepInput } from '@/lib/schemas/route';
import { addTerm, insertionFor, replaceNamed, type Phase, type Side } from './species-insert';

export const MAX_EQUATION = 500;

/** The species as saved or found: name, canonical SMILES (null for one without a structure), phase and key. */
export interface PickedSpecies {
  name: string;
  smiles: string | null;
  phase: Phase;
  key: string;
}

/** What the "not in the library" message carried: the structure, name and phase the step wrote. */
export interface SpeciesAsk {
  smiles?: string | null;
  name?: string | null;
  phase?: string | null;
}

type StepText = Pick<StepInput, 'equation' | 'species'>;

export interface Placement extends StepText {
  /** the text that stands for the species in the equation */
  term: string;
  /** replaced: a name the step wrote now names it; bound: the step's label for the structure now names it; added: a new term */
  how: 'replaced' | 'bound' | 'added';
}

/** The step that gets the species: the one that asked, else the selected one; null when neither is on the board. */
export function receivingStep(askedStepId: string | null, selectedStepId: string | null, stepIds: readonly string[]): string | null {
  if (askedStepId && stepIds.includes(askedStepId)) return askedStepId;
  if (selectedStepId && stepIds.includes(selectedStepId)) return selectedStepId;
  return null;
}

const hitOf = (pick: PickedSpecies) => ({ name: pick.name, smiles: pick.smiles, phases: [{ phase: pick.phase, key: pick.key, source: '' }] });

// Not a character an equation holds: marks the place of the replaced name while a free label is chosen.
const MARK = '\u0001';

/**
 * The asking step with the species in the place the step had for it: the label bound to the asked structure is bound
 * to the species (same phase), or the name written in the equation is replaced by the species' term. Null when the
 * step wrote neither (or in another phase), so the user chooses a side instead.
 */
export function placeAsked(step: StepText, ask: SpeciesAsk, pick: PickedSpecies): Placement | null {
  if (ask.phase && ask.phase !== pick.phase) return null;
  if (ask.smiles) {
    const bound = Object.entries(step.species ?? {}).find(([, d]) => 'smiles' in d && d.smiles === ask.smiles && d.phase === pick.phase);
    if (bound) {
      const definition = pick.smiles ? { smiles: pick.smiles, phase: pick.phase, name: pick.name.slice(0, 120) } : { key: pick.key };
      return { equation: step.equation, species: { ...step.species, [bound[0]]: definition }, term: bound[0], how: 'bound' };
    }
  }
  if (ask.name && ask.phase) {
    const marked = replaceNamed(step.equation, ask.name, ask.phase, MARK);
    if (marked === step.equation) return null;
    const insertion = insertionFor(hitOf(pick), pick.phase, step.species, marked);
    return { equation: marked.split(MARK).join(insertion.term), species: insertion.species, term: insertion.term, how: 'replaced' };
  }
  return null;
}

/** The step with the species added to one side, as the Add species search adds it. */
export function placeOnSide(step: StepText, pick: PickedSpecies, side: Side): Placement {
  const insertion = insertionFor(hitOf(pick), pick.phase, step.species, step.equation);
  return { equation: addTerm(step.equation, side, insertion.term), species: insertion.species, term: insertion.term, how: 'added' };
}
