import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { EditorsOnly } from '../_components/editors-only';
import { TeamSpeciesFormView } from '../_components/team-species-form';

export const metadata: Metadata = { title: 'Add a species' };

export default function NewSpeciesPage() {
  return (
    <>
      <PageHeader title="Add a species" lead="Your team’s own values, used in your team’s evaluations only. Say where they come from: every number needs a source." />
      <EditorsOnly>
        <TeamSpeciesFormView />
      </EditorsOnly>
    </>
  );
}
