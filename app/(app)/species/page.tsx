import type { Metadata } from 'next';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Species' };

export default function SpeciesPage() {
  return (
    <>
      <PageHeader title="Species" lead="The thermodynamic data behind every evaluation: built-in published values and your team’s own, each with its source." />
      <EmptyState title="Browsing the library is not available yet">
        The built-in library is already used by every evaluation. Browsing it, adding your team’s own species with their provenance, and CSV
        import will appear here.
      </EmptyState>
    </>
  );
}
