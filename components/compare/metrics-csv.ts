// The metrics table as CSV: numbers stay numbers (energies in the reader's unit), text rows as shown.
import { writeCsv } from '@/lib/csv/write-csv';
import type { Comparison, MetricKey, RouteMetrics } from '@/lib/compare/compare-types';
import { METRIC_ROWS } from '@/lib/compare/metric-rows';
import { energyFromKJ, energyUnitLabel } from '../ladder/energy-format';
import { metricText, type MetricUnits } from './metric-format';

const ENERGY_KEYS = new Set<MetricKey>(['overallDeltaG_kJ', 'overallDeltaG0_kJ', 'largestUphill_kJ', 'smallestDrivingForce_kJ']);

function cell(key: MetricKey, m: RouteMetrics, units: MetricUnits): string | number {
  if (ENERGY_KEYS.has(key)) {
    const v = m[key as 'overallDeltaG_kJ'];
    return v === null ? '' : Number(energyFromKJ(v, units.energyUnit).toFixed(3));
  }
  if (key === 'updatedAt') return m.updatedAt;
  return metricText(key, m, units);
}

export function metricsCsv(comparison: Comparison, units: MetricUnits, visible: ReadonlySet<MetricKey>): string {
  const rows = METRIC_ROWS.filter((r) => visible.has(r.key));
  const header = ['Metric', 'Basis', ...comparison.routes.map((r) => r.name), 'Best'];
  const body = rows.map((r) => [
    r.label,
    ENERGY_KEYS.has(r.key) ? `${energyUnitLabel(units.energyUnit)} ${r.basis}` : r.basis,
    ...comparison.routes.map((route) => cell(r.key, route.metrics, units)),
    r.best === 'none' ? '' : comparison.routes.filter((route) => (comparison.best[r.key] ?? []).includes(route.id)).map((route) => route.name).join('; '),
  ]);
  return writeCsv([header, ...body]);
}
