'use client';

// New species from a structure: paste, see what Stepwell knows or estimates, then keep it for the team. A structure
// the library has with sourced data, or the team already has, is pointed at instead of copied.
import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { speciesHref } from '@/components/tables/species-columns';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/queries/api-fetch';
import { structureEstimateQuery, type StructureRequest } from '@/lib/queries/species-structure';
import type { TeamSpeciesDto } from '@/lib/services/species/species-dto';
import { EditorsOnly } from '../_components/editors-only';
import type { StructureSeed } from '../_components/from-structure-href';
import { SaveStructureSpecies } from './save-structure-species';
import { readableName, StructureEstimate } from './structure-estimate';
import { StructureInput, structureErrorText } from './structure-input';

type Phase = StructureRequest['phase'];

function Saved({ saved, returnTo }: { saved: TeamSpeciesDto & { warnings: string[] }; returnTo: string | null }) {
  const typed = /^(?:[a-z]|\d+(?:,\d+)*-[A-Za-z])[A-Za-z0-9 ,-]*$/.test(saved.name) ? `${saved.name}(${saved.phase})` : null;
  return (
    <Notice tone="success" title={`“${saved.name}” is now one of your team’s species`}>
      <p>
        Provenance: {saved.provenance.kind === 'estimated' ? `estimated (${saved.provenance.method})` : saved.provenance.kind === 'measured' ? `measured (${saved.provenance.reference})` : `published (${saved.provenance.citation})`}.
        {saved.provenance.kind === 'estimated' ? ' Wherever it is used, its values stay marked as an estimate.' : ''}
      </p>
      {typed ? <p>In a step, write it as <code className="font-mono">{typed}</code>, or bind a label to its SMILES.</p> : <p>In a step, bind a label to its SMILES, or give it a name that starts in lower case to type it.</p>}
      {saved.warnings.map((w) => <p key={w}>{w}</p>)}
      <p className="mt-1 flex flex-wrap gap-3">
        {returnTo ? <Link href={returnTo} className="font-semibold underline" data-testid="back-to-route">Back to the route</Link> : null}
        <Link href={speciesHref(saved.key)} className="underline">See its values and plots</Link>
        <Link href={`/species/team/${saved.id}/edit`} className="underline">Edit it</Link>
      </p>
    </Notice>
  );
}

export function FromStructureClient({ seed }: { seed: Required<StructureSeed> }) {
  const [request, setRequest] = useState<StructureRequest | null>(seed.smiles ? { smiles: seed.smiles, phase: (seed.phase ?? 'l') as Phase } : null);
  const [saved, setSaved] = useState<(TeamSpeciesDto & { warnings: string[] }) | null>(null);
  const estimate = useQuery({ ...structureEstimateQuery(request ?? { smiles: '', phase: 'l' }), enabled: request !== null });
  const answer = request ? estimate.data : undefined;
  const refusal = request && estimate.isError ? structureErrorText(estimate.error) : null;
  // The engine read the structure but no method covers it (a solid, an ion, a group it lacks): values can still be entered.
  const unsupported = estimate.error instanceof ApiError && estimate.error.code === 'UNSUPPORTED_STRUCTURE';

  if (saved) return <Saved saved={saved} returnTo={seed.returnTo} />;
  return (
    <EditorsOnly>
      <div className="flex flex-col gap-6">
        <StructureInput
          initialSmiles={seed.smiles ?? ''}
          initialPhase={(seed.phase ?? 'l') as Phase}
          isPending={request !== null && estimate.isFetching}
          error={refusal}
          onSubmit={setRequest}
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
              </Notice>
            ) : answer.origin === 'library' ? (
              <>
                <Notice tone="info" title={`The library already has ${answer.name} (${answer.phase}) with sourced data`}>
                  From {answer.source}. <Link href={speciesHref(answer.key)} className="underline">Use the library species</Link>: write it by name or bind a label to its SMILES. Only your own measured or published values should replace it.
                </Notice>
                <details className="max-w-3xl text-sm">
                  <summary className="cursor-pointer text-pine-700">Use our own measured or published values for this team instead</summary>
                  <div className="mt-3">
                    <SaveStructureSpecies request={request!} suggestedName={answer.name} canEstimate={false} overridesLibrary onSaved={setSaved} />
                  </div>
                </details>
              </>
            ) : (
              <SaveStructureSpecies request={request!} suggestedName={seed.name ?? readableName(answer) ?? ''} canEstimate overridesLibrary={false} onSaved={setSaved} />
            )}
          </>
        ) : null}
        {request && unsupported && !estimate.isFetching ? (
          <SaveStructureSpecies request={request} suggestedName={seed.name ?? ''} canEstimate={false} overridesLibrary={false} onSaved={setSaved} />
        ) : null}
      </div>
    </EditorsOnly>
  );
}
