import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { TeamClient } from './team-client';

export const metadata: Metadata = { title: 'Team' };

export default function TeamPage() {
  return (
    <>
      <PageHeader title="Team" lead="Who works on this team’s routes, and what each person may do. Leads invite people and manage roles." />
      <TeamClient />
    </>
  );
}
