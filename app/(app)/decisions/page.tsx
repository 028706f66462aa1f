import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { DecisionsClient } from './decisions-client';

export const metadata: Metadata = { title: 'Decisions' };

export default function DecisionsPage() {
  return (
    <>
      <PageHeader title="Decisions" lead="Which route the group went on with, and why: each decision keeps the comparison it was made on." />
      <DecisionsClient />
    </>
  );
}
