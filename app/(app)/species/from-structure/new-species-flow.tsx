'use client';

// New species from a structure, the flow itself: paste, see what Stepwell knows or estimates, then keep it for the
// team. A structure the library has with sourced data, or the team already has, is pointed at instead of copied.
// Shared by the page (/species/from-structure) and the dialog over the route board, which may use what it finds.
import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { speciesHref } from '@/components/tables/species-columns';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/queries/api-fetch';
import { structureEstimateQuery, type StructureRequest } from '@/lib/queries/species-structure';
import type { TeamSpeciesDto } from '@/lib/services/species/species-dto';
import { SaveStructureSpecies } from './save-structure-species';
import { readableName, StructureEstimate } from './structure-estimate';
import { StructureInput, structureErrorText } from './structure-input';

type Phase = StructureRequest['phase'];
export type SavedStructureSpecies = TeamSpeciesDto & { warnings: string[] };

/** What a step needs to write a species: its name, structure, phase and key (a library key or a structure key). */
export interface SpeciesPick {
  name: string;
  smiles: string | null;
  phase: Phase;
  key: string;
}

export interface FlowSeed {
  smiles: string | null;
  name: string | null;
  phase: string | null;
}

export function NewSpeciesFlow({ seed, onSaved, onUseExisting, autoFocus = false }: {
  seed: FlowSeed;
  onSaved: (saved: SavedStructureSpecies) => void;
  /** on the board: use the library's or the team's species for this structure instead of saving a copy */
  onUseExisting?: (pick: SpeciesPick) => void;
  autoFocus?: boolean;
}) {
  const [request, setRequest] = useState<StructureRequest | null>(seed.smiles ? { smiles: seed.smiles, phase: (seed.phase ?? 'l') as Phase } : null);
  const estimate = useQuery({ ...structureEstimateQuery(request ?? { smiles: '', phase: 'l' }), enabled: request !== null });
  const answer = request ? estimate.data : undefined;
  const refusal = request && estimate.isError ? structureErrorText(estimate.error) : null;
  // The engine read the structure but no method covers it (a solid, an ion, a group it lacks): values can still be entered.
  const unsupported = estimate.error instanceof ApiError && estimate.error.code === 'UNSUPPORTED_STRUCTURE';
  const use = (name: string) =>
    answer && onUseExisting ? (
      <Button variant="secondary" className="mt-1.5" onClick={() => onUseExisting({ name, smiles: answer.smiles ?? null, phase: answer.phase, key: answer.key })}>
        Use it in the step
      </Button>
    ) : null;

  return (
    <div className="flex flex-col gap-6">
      <StructureInput
        initialSmiles={seed.smiles ?? ''}
        initialPhase={(seed.phase ?? 'l') as Phase}
        isPending={request !== null && estimate.isFetching}
        error={refusal}
        onSubmit={setRequest}
        autoFocus={autoFocus}
      />
      {request && estimate.isFetching ? <p className="text-sm text-ink-soft" role="status" aria-live="polite">Reading the structure and estimating…</p> : null}
      {request && estimate.isError && !refusal ? <Notice tone="error">{estimate.error.message}</Notice> : null}
      {answer && !estimate.isFetching ? (
        <>
          <StructureEstimate answer={answer} />
          {answer.teamSpecies ? (
            <Notice tone="info" title={`Your team already has this structure: “${answer.teamSpecies.name}”`}>
              <Link href={speciesHref(answer.key)} className="underline">See it</Link> or{' '}
              <Link href={`/species/team/${answer.teamSpecies.id}/edit`} className="underline">edit its values</Link>; a second copy would only confuse which one a step uses.
              {use(answer.teamSpecies.name)}
            </Notice>
          ) : answer.origin === 'library' ? (
            <>
              <Notice tone="info" title={`The library already has ${answer.name} (${answer.phase}) with sourced data`}>
                From {answer.source}. <Link href={speciesHref(answer.key)} className="underline">Use the library species</Link>: write it by name or bind a label to its SMILES. Only your own measured or published values should replace it.
                {use(answer.name)}
              </Notice>
              <details className="max-w-3xl text-sm">
                <summary className="cursor-pointer text-pine-700">Use our own measured or published values for this team instead</summary>
                <div className="mt-3">
                  <SaveStructureSpecies request={request!} suggestedName={answer.name} canEstimate={false} overridesLibrary onSaved={onSaved} />
                </div>
              </details>
            </>
          ) : (
            <SaveStructureSpecies request={request!} suggestedName={seed.name ?? readableName(answer) ?? ''} canEstimate overridesLibrary={false} onSaved={onSaved} />
          )}
        </>
      ) : null}
      {request && unsupported && !estimate.isFetching ? (
        <SaveStructureSpecies request={request} suggestedName={seed.name ?? ''} canEstimate={false} overridesLibrary={false} onSaved={onSaved} />
      ) : null}
    </div>
  );
}
