import type { Metadata } from 'next';
import { Notice } from '@/components/ui/notice';
import { parseIds } from '../parse-ids';
import { ReportClient } from './report-client';

export const metadata: Metadata = { title: 'Route comparison report' };

export default async function CompareReportPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const ids = parseIds(params.ids);
  if (!ids) return <Notice tone="error" title="No routes to report on">Open a comparison first and choose “Printable report”.</Notice>;
  const offset = typeof params.temperatureOffset_K === 'string' && /^[+-]?\d+(\.\d+)?$/.test(params.temperatureOffset_K) ? Number(params.temperatureOffset_K) : undefined;
  const pressure = params.standardPressure === '1 bar' || params.standardPressure === '1 atm' ? params.standardPressure : undefined;
  const basis = params.basis === 'standard' ? 'standard' : 'conditions';
  return <ReportClient ids={ids} whatIf={{ ...(offset !== undefined ? { temperatureOffset_K: offset } : {}), ...(pressure ? { standardPressure: pressure } : {}) }} basis={basis} />;
}
