import type { Metadata } from 'next';
import { SpeciesDetailClient } from './species-detail-client';

export const metadata: Metadata = { title: 'Species' };

// Loaded in the browser: the same key can mean the built-in record or the team's own, depending on who asks.
export default async function SpeciesDetailPage({ params }: { params: Promise<{ key: string }> }) {
  const { key } = await params;
  return <SpeciesDetailClient speciesKey={decodeURIComponent(key)} />;
}
