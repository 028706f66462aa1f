import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { EditorsOnly } from '../_components/editors-only';
import { ImportHistory } from './import-history';
import { SpeciesImportClient } from './species-import-client';

export const metadata: Metadata = { title: 'Import species' };

export default function SpeciesImportPage() {
  return (
    <>
      <PageHeader title="Import species from CSV" lead="Upload a file, check every row, choose what to do with species you already have, then import all of it or none." />
      <EditorsOnly>
        <SpeciesImportClient />
      </EditorsOnly>
      <ImportHistory />
    </>
  );
}
