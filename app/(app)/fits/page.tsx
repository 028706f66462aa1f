import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { FitsClient } from './fits-client';

export const metadata: Metadata = { title: 'Data fits' };

export default function FitsPage() {
  return (
    <>
      <PageHeader title="Data fits" lead="Fit ΔH° and ΔS° from equilibrium constants measured at several temperatures (van ’t Hoff: ln K against 1/T)." />
      <FitsClient />
    </>
  );
}
