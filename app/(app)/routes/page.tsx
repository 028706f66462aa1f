import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { RoutesClient } from './routes-client';

export const metadata: Metadata = { title: 'Routes' };

export default function RoutesPage() {
  return (
    <>
      <PageHeader title="Routes" lead="Synthesis routes of your team, from feedstocks to target, with where each one climbs in free energy." />
      <RoutesClient />
    </>
  );
}
