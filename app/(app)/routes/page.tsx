import type { Metadata } from 'next';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Routes' };

export default function RoutesPage() {
  return (
    <>
      <PageHeader title="Routes" lead="Synthesis routes of your team, from feedstocks to target, with where each one climbs in free energy." />
      <EmptyState title="No routes yet">
        The route board is not built yet. Until it is, single steps can be evaluated through the API (<code>POST /api/evaluate</code>) and the
        command line (<code>npm run -s thermo -- evaluate</code>); see the README.
      </EmptyState>
    </>
  );
}
