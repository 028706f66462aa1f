import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { Notice } from '@/components/ui/notice';
import { CompareClient } from './compare-client';
import { parseIds } from './parse-ids';

export const metadata: Metadata = { title: 'Compare routes' };

export default async function ComparePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const ids = parseIds((await searchParams).ids);
  return (
    <>
      <PageHeader title="Compare routes" lead="Alternative routes to a target side by side, on one free-energy scale, with the numbers that decide between them." />
      {ids ? (
        <CompareClient ids={ids} />
      ) : (
        <Notice tone="error" title="No routes to compare">
          Pick 2 to 4 routes on the routes list and choose “Compare selected”.
        </Notice>
      )}
    </>
  );
}
