'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { ApiError } from '@/lib/queries/api-fetch';
import { teamSpeciesQuery } from '@/lib/queries/species';
import { EditorsOnly } from '../../../_components/editors-only';
import { TeamSpeciesFormView } from '../../../_components/team-species-form';

export function EditTeamSpeciesClient({ id }: { id: number }) {
  // Read once: refetching after a save would reset the form and hide what the save changed.
  const species = useQuery({ ...teamSpeciesQuery(id), staleTime: Infinity, refetchOnWindowFocus: false });
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
      <PageHeader title={`Edit ${species.data.key}`} lead="Saving changes the values every evaluation of your team uses from now on. Check first which routes would change." />
      <EditorsOnly>
        <TeamSpeciesFormView existing={species.data} />
      </EditorsOnly>
    </>
  );
}
