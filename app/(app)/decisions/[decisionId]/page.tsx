import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { DecisionDetailClient } from './decision-detail-client';

export const metadata: Metadata = { title: 'Decision' };

// The decision is loaded in the browser; the API answers 404 for another team's id exactly as for a missing one.
export default async function DecisionPage({ params }: { params: Promise<{ decisionId: string }> }) {
  const { decisionId } = await params;
  if (!/^\d{1,9}$/.test(decisionId) || Number(decisionId) === 0) notFound();
  return <DecisionDetailClient decisionId={Number(decisionId)} />;
}
