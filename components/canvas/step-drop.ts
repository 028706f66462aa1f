// What the palette hands the canvas through HTML5 drag-and-drop: the equation of the step to add, and the labels
// it binds to a structure (a recent step's "KR117-nitro" → SMILES), so the new step reads as the old one did.
import type { SpeciesDefinition } from '@/lib/thermo/structure/structure-lookup-type';

export const STEP_DRAG_MIME = 'application/x-stepwell-step';

export interface StepDragPayload {
  equation: string;
  temperature?: string;
  species?: Record<string, SpeciesDefinition>;
}

// The save checks every definition; here only the shape, so a foreign drop cannot put junk in the draft.
function speciesOf(value: unknown): Record<string, SpeciesDefinition> | undefined {
  if (!value || typeof value !== 'object' || Array.isArray(value)) return undefined;
  const entries = Object.entries(value as Record<string, unknown>).filter(([, def]) => def !== null && typeof def === 'object' && !Array.isArray(def));
  return entries.length ? (Object.fromEntries(entries) as Record<string, SpeciesDefinition>) : undefined;
}

export function writeStepPayload(dataTransfer: DataTransfer, payload: StepDragPayload): void {
  dataTransfer.setData(STEP_DRAG_MIME, JSON.stringify(payload));
  dataTransfer.setData('text/plain', payload.equation);
  dataTransfer.effectAllowed = 'copy';
}

export function hasStepPayload(dataTransfer: DataTransfer): boolean {
  return Array.from(dataTransfer.types).includes(STEP_DRAG_MIME);
}

export function readStepPayload(dataTransfer: DataTransfer): StepDragPayload | null {
  const raw = dataTransfer.getData(STEP_DRAG_MIME);
  if (!raw) return null;
  try {
    const value = JSON.parse(raw) as Partial<StepDragPayload>;
    if (typeof value.equation !== 'string') return null;
    const species = speciesOf(value.species);
    return { equation: value.equation, temperature: typeof value.temperature === 'string' ? value.temperature : undefined, ...(species ? { species } : {}) };
  } catch {
    return null;
  }
}
