// Which route holds the best value in each metric row. Ties share it; a route without a value for a row never wins it.
import type { MetricKey, RouteMetrics } from './compare-types';
import { METRIC_ROWS, type MetricRow } from './metric-rows';

export interface RankedRoute {
  id: number;
  /** false when the engine refused the route as a whole: its energy rows are not ranked */
  evaluated: boolean;
  metrics: RouteMetrics;
}

/** kJ differences below this are ties (values arrive through floating-point sums). */
export const TIE_TOLERANCE = 1e-6;

// The number a row is ranked by, or null when the route has no place in that row.
function rankValue(row: MetricRow, route: RankedRoute): number | null {
  const m = route.metrics;
  switch (row.key) {
    case 'stepCount':
      return m.stepCount;
    case 'openFlags':
      return m.openFlags;
    case 'unresolvedComments':
      return m.unresolvedComments;
    case 'largestUphill_kJ':
      // No uphill step at all ranks below any climb (every uphill ΔG is above 0).
      return route.evaluated ? (m.largestUphill_kJ ?? 0) : null;
    case 'driversNeeded':
      return route.evaluated && m.uncoupledUphillSteps === 0 ? m.driversNeeded.length : null;
    case 'overallDeltaG_kJ':
    case 'overallDeltaG0_kJ':
    case 'uphillSteps':
    case 'marginalSteps':
    case 'smallestDrivingForce_kJ': {
      const v = route.evaluated ? m[row.key] : null;
      return typeof v === 'number' && Number.isFinite(v) ? v : null;
    }
    default:
      return null;
  }
}

function bestOf(row: MetricRow, routes: readonly RankedRoute[]): number[] {
  if (row.best === 'none') return [];
  if (row.best === 'approved') return routes.filter((r) => r.metrics.status === 'approved').map((r) => r.id);
  const valued = routes.map((r) => ({ id: r.id, v: rankValue(row, r) })).filter((x): x is { id: number; v: number } => x.v !== null);
  if (valued.length === 0) return [];
  const sign = row.best === 'highest' ? -1 : 1;
  const target = Math.min(...valued.map((x) => sign * x.v));
  return valued.filter((x) => sign * x.v - target <= TIE_TOLERANCE).map((x) => x.id);
}

export function bestPerRow(routes: readonly RankedRoute[]): Record<MetricKey, number[]> {
  return Object.fromEntries(METRIC_ROWS.map((row) => [row.key, bestOf(row, routes)])) as Record<MetricKey, number[]>;
}
