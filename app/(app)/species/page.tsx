import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { SpeciesClient } from './species-client';

export const metadata: Metadata = { title: 'Species' };

export default function SpeciesPage() {
  return (
    <>
      <PageHeader title="Species" lead="The thermodynamic data behind every evaluation: built-in published values and your team’s own, each with its source." />
      <SpeciesClient />
    </>
  );
}
