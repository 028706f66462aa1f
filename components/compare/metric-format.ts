// How each row of the comparison table reads, and the number it sorts by.
import type { MetricKey, RouteMetrics } from '@/lib/compare/compare-types';
import { energyUnitLabel, formatEnergyValue, formatTemperature, type EnergyUnit, type TemperatureUnit } from '@/lib/format/units';
import { formatWhen } from '../ui/when';
import { ROUTE_STATUS_LABELS, type RouteStatus } from '@/lib/schemas/workflow';

export interface MetricUnits {
  energyUnit: EnergyUnit;
  temperatureUnit: TemperatureUnit;
}

const ENERGY_KEYS = new Set<MetricKey>(['overallDeltaG_kJ', 'overallDeltaG0_kJ', 'largestUphill_kJ', 'smallestDrivingForce_kJ']);
const COUNT_KEYS = new Set<MetricKey>(['stepCount', 'uphillSteps', 'marginalSteps', 'estimatedSteps', 'openFlags', 'unresolvedComments']);

/** The unit of a row's values, stated once beside its name ("kJ/mol"); null for rows whose cells carry their own. */
export function metricUnit(key: MetricKey, units: MetricUnits): string | null {
  return ENERGY_KEYS.has(key) ? `${energyUnitLabel(units.energyUnit)}/mol` : null;
}

/** A cell's text: energies as bare numbers with the true minus (the unit is in the row's name), the rest in words. */
export function metricText(key: MetricKey, m: RouteMetrics, units: MetricUnits): string {
  if (ENERGY_KEYS.has(key)) {
    const v = m[key as 'overallDeltaG_kJ'];
    if (key === 'largestUphill_kJ' && v === null) return 'no uphill step';
    return formatEnergyValue(v, units.energyUnit);
  }
  if (COUNT_KEYS.has(key)) {
    // A decision recorded before a row existed has no value for it: '—', as for a route the engine refused.
    const v = m[key as 'estimatedSteps'];
    if (v === null || v === undefined) return '—';
    return String(v);
  }
  switch (key) {
    case 'temperatureSpan':
      return m.temperatureMin_K === null || m.temperatureMax_K === null
        ? '—'
        : m.temperatureMin_K === m.temperatureMax_K
          ? formatTemperature(m.temperatureMin_K, units.temperatureUnit)
          : `${formatTemperature(m.temperatureMin_K, units.temperatureUnit)} – ${formatTemperature(m.temperatureMax_K, units.temperatureUnit)}`;
    case 'driversNeeded': {
      const names = m.driversNeeded.length ? m.driversNeeded.join(', ') : m.uphillSteps ? 'none found' : 'none needed';
      return m.uncoupledUphillSteps ? `${names}; ${m.uncoupledUphillSteps} uphill step${m.uncoupledUphillSteps === 1 ? '' : 's'} without one` : names;
    }
    case 'status':
      return ROUTE_STATUS_LABELS[m.status as RouteStatus] ?? m.status;
    case 'updatedAt':
      return formatWhen(m.updatedAt);
    case 'updatedBy':
      return m.updatedBy;
    default:
      return '—';
  }
}

/** A number to order routes by for a row (null sorts last), or a string for the text rows. */
export function metricSortValue(key: MetricKey, m: RouteMetrics): number | string | null {
  if (ENERGY_KEYS.has(key)) return m[key as 'overallDeltaG_kJ'];
  if (COUNT_KEYS.has(key)) return m[key as 'estimatedSteps'] ?? null;
  switch (key) {
    case 'temperatureSpan':
      return m.temperatureMin_K === null || m.temperatureMax_K === null ? null : m.temperatureMax_K - m.temperatureMin_K;
    case 'driversNeeded':
      return m.driversNeeded.length + (m.uncoupledUphillSteps ?? 0) * 100;
    case 'updatedAt':
      return Date.parse(m.updatedAt);
    case 'status':
    case 'updatedBy':
      return m[key];
    default:
      return null;
  }
}
