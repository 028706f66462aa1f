import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { readSeed } from '../_components/from-structure-href';
import { FromStructureClient } from './from-structure-client';

export const metadata: Metadata = { title: 'New species from a structure' };

export default async function FromStructurePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const seed = readSeed(await searchParams);
  return (
    <>
      <PageHeader
        title="New species from a structure"
        lead="Paste a SMILES or a molfile. Stepwell shows what it knows of the molecule, or its group-additivity estimate with σ and every group it used, before anything is saved."
      />
      <FromStructureClient seed={seed} />
    </>
  );
}
