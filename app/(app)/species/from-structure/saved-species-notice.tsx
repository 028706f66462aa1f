'use client';

// What was saved, its provenance (an estimate stays marked as one), how a step writes it, and where to see or edit it.
import Link from 'next/link';
import type { ReactNode } from 'react';
import { speciesHref } from '@/components/tables/species-columns';
import { Notice } from '@/components/ui/notice';
import type { SavedStructureSpecies } from './new-species-flow';

export function provenanceText(saved: Pick<SavedStructureSpecies, 'provenance'>): string {
  const p = saved.provenance;
  return p.kind === 'estimated' ? `estimated (${p.method})` : p.kind === 'measured' ? `measured (${p.reference})` : `published (${p.citation})`;
}

export function SavedSpeciesNotice({ saved, returnTo, howToUse = true, children }: { saved: SavedStructureSpecies; returnTo: string | null; howToUse?: boolean; children?: ReactNode }) {
  const typed = /^(?:[a-z]|\d+(?:,\d+)*-[A-Za-z])[A-Za-z0-9 ,-]*$/.test(saved.name) ? `${saved.name}(${saved.phase})` : null;
  return (
    <Notice tone="success" title={`“${saved.name}” is now one of your team’s species`}>
      <p>
        Provenance: {provenanceText(saved)}.
        {saved.provenance.kind === 'estimated' ? ' Wherever it is used, its values stay marked as an estimate.' : ''}
      </p>
      {howToUse ? (
        typed ? <p>In a step, write it as <code className="font-mono">{typed}</code>, or bind a label to its SMILES.</p> : <p>In a step, bind a label to its SMILES, or give it a name that starts in lower case to type it.</p>
      ) : null}
      {saved.warnings.map((w) => <p key={w}>{w}</p>)}
      {children}
      <p className="mt-1 flex flex-wrap gap-3">
        {returnTo ? <Link href={returnTo} className="font-semibold underline" data-testid="back-to-route">Back to the route</Link> : null}
        <Link href={speciesHref(saved.key)} className="underline">See its values and plots</Link>
        <Link href={`/species/team/${saved.id}/edit`} className="underline">Edit it</Link>
      </p>
    </Notice>
  );
}
