import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { SettingsForm } from './settings-form';

export const metadata: Metadata = { title: 'Settings' };

export default function SettingsPage() {
  return (
    <>
      <PageHeader title="Settings" lead="Units Stepwell uses to show results to you. Calculations always run in SI; only the display changes." />
      <SettingsForm />
    </>
  );
}
