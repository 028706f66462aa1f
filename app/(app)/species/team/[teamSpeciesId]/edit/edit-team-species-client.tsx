'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { ApiError } from '@/lib/queries/api-fetch';
import { teamSpeciesQuery } from '@/lib/queries/species';
import { DeleteTeamSpecies } from '../../../_components/delete-team-species';
import { EditorsOnly } from '../../../_components/editors-only';
import { TeamSpeciesFormView } from '../../../_components/team-species-form';

export function EditTeamSpeciesClient({ id }: { id: number }) {
  // Read once: refetching after a save would reset the form and hide what the save changed.
  const species = useQuery({ ...teamSpeciesQuery(id), staleTime: Infinity, refetchOnWindowFocus: false });
  // The form moves the version on with each save; a delete must send the latest one.
  const [savedVersion, setSavedVersion] = useState<number | null>(null);
  if (species.isPending) return <p className="py-6 text-sm text-ink-soft" role="status">Loading the species…</p>;
  if (species.isError) {
    return (
      <Notice tone="error" title={species.error instanceof ApiError && species.error.status === 404 ? 'No such species in your team' : 'The species could not be loaded'}>
        {species.error.message} <Link href="/species" className="underline">Back to the species list</Link>
      </Notice>
    );
  }
  return (
    <>
      {/* A structure key ({InChIKey}(l)) means nothing to a reader: such species go by their name. */}
      <PageHeader title={`Edit ${species.data.key.startsWith('{') ? species.data.name : species.data.key}`} lead="Saving changes the values every evaluation of your team uses from now on. Check first which routes would change." />
      <EditorsOnly>
        <div className="flex flex-col gap-8">
          <TeamSpeciesFormView existing={species.data} onVersion={setSavedVersion} />
          <DeleteTeamSpecies id={species.data.id} name={species.data.name} version={savedVersion ?? species.data.version} />
        </div>
      </EditorsOnly>
    </>
  );
}
