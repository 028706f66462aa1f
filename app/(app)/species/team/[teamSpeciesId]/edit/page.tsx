import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { EditTeamSpeciesClient } from './edit-team-species-client';

export const metadata: Metadata = { title: 'Edit a species' };

export default async function EditTeamSpeciesPage({ params }: { params: Promise<{ teamSpeciesId: string }> }) {
  const { teamSpeciesId } = await params;
  if (!/^\d{1,9}$/.test(teamSpeciesId) || Number(teamSpeciesId) === 0) notFound();
  return <EditTeamSpeciesClient id={Number(teamSpeciesId)} />;
}
