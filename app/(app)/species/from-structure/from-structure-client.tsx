'use client';

// The page's view of "new species from a structure": the shared flow, then what was saved and the way back.
import { useState } from 'react';
import { EditorsOnly } from '../_components/editors-only';
import type { StructureSeed } from '../_components/from-structure-href';
import { NewSpeciesFlow, type SavedStructureSpecies } from './new-species-flow';
import { SavedSpeciesNotice } from './saved-species-notice';

export function FromStructureClient({ seed }: { seed: Required<StructureSeed> }) {
  const [saved, setSaved] = useState<SavedStructureSpecies | null>(null);
  if (saved) return <SavedSpeciesNotice saved={saved} returnTo={seed.returnTo} />;
  return (
    <EditorsOnly>
      <NewSpeciesFlow seed={seed} onSaved={setSaved} />
    </EditorsOnly>
  );
}
