import type { Metadata } from 'next';
import Link from 'next/link';
import { PageHeader } from '@/components/ui/page-header';
import { DriversClient } from './drivers-client';

export const metadata: Metadata = { title: 'Driver reactions' };

export default function DriversPage() {
  return (
    <>
      <PageHeader
        title="Driver reactions"
        lead={
          <>
            Strongly downhill reactions your team offers as coupling partners for uphill steps. Each is evaluated with the species library at
            the uphill step’s temperature. <Link href="/routes" className="text-pine-700 underline">Back to routes</Link>
          </>
        }
      />
      <DriversClient />
    </>
  );
}
