import type { Metadata } from 'next';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Data fits' };

export default function FitsPage() {
  return (
    <>
      <PageHeader title="Data fits" lead="Fit ΔH° and ΔS° from equilibrium constants measured at several temperatures (van ’t Hoff: ln K against 1/T)." />
      <EmptyState title="No data sets yet">
        Saving data sets here is not available yet. The fit itself already runs through <code>POST /api/fit</code> and{' '}
        <code>npm run -s thermo -- fit</code>.
      </EmptyState>
    </>
  );
}
