import type { Metadata } from 'next';
import Link from 'next/link';
import { PageHeader } from '@/components/ui/page-header';
import { EditorsOnly } from '../_components/editors-only';
import { TeamSpeciesFormView } from '../_components/team-species-form';

export const metadata: Metadata = { title: 'Add a species' };

export default function NewSpeciesPage() {
  return (
    <>
      <PageHeader title="Add a species" lead="Your team’s own values, used in your team’s evaluations only. Say where they come from: every number needs a source." />
      <p className="mb-4 max-w-3xl text-sm text-ink-soft">
        Have its structure? <Link href="/species/from-structure" className="font-medium text-pine-700 underline">New species from a structure</Link> shows Stepwell’s estimate first and keeps the species known by its InChIKey.
      </p>
      <EditorsOnly>
        <TeamSpeciesFormView />
      </EditorsOnly>
    </>
  );
}
