// The rows of the comparison table and what "best" means in each. Pure, shared by the API and the page.
import type { MetricKey } from './compare-types';

export type BestRule = 'lowest' | 'highest' | 'approved' | 'fewest-drivers' | 'none';

export interface MetricRow {
  key: MetricKey;
  label: string;
  /** what the number is per, for the table's unit column */
  basis: string;
  best: BestRule;
  /** one line for the table's legend */
  bestMeans: string;
}

export const METRIC_ROWS: readonly MetricRow[] = [
  { key: 'overallDeltaG_kJ', label: 'Overall ΔG', basis: 'per mol of target', best: 'lowest', bestMeans: 'most negative' },
  { key: 'overallDeltaG0_kJ', label: 'Overall ΔG°', basis: 'per mol of target', best: 'lowest', bestMeans: 'most negative' },
  { key: 'stepCount', label: 'Steps', basis: 'count', best: 'lowest', bestMeans: 'fewest' },
  { key: 'uphillSteps', label: 'Uphill steps', basis: 'count', best: 'lowest', bestMeans: 'fewest' },
  { key: 'marginalSteps', label: 'Marginal steps', basis: 'count', best: 'lowest', bestMeans: 'fewest' },
  { key: 'largestUphill_kJ', label: 'Largest uphill ΔG', basis: 'per mol of target', best: 'lowest', bestMeans: 'smallest climb; no uphill step beats any' },
  { key: 'smallestDrivingForce_kJ', label: 'Smallest driving force (−ΔG)', basis: 'per mol of reaction as written', best: 'highest', bestMeans: 'largest weakest link' },
  // Not ranked: an estimate is less certain, not worse chemistry; each step's σ is on the ladder.
  { key: 'estimatedSteps', label: 'Estimated values used', basis: 'steps', best: 'none', bestMeans: 'not ranked: steps whose ΔG uses group-contribution estimates, not measured values; their σ is on each ladder' },
  { key: 'temperatureSpan', label: 'Temperature span', basis: 'K', best: 'none', bestMeans: 'not ranked: a wide span is neither better nor worse in itself' },
  { key: 'driversNeeded', label: 'Drivers needed for coupling', basis: 'names', best: 'fewest-drivers', bestMeans: 'fewest drivers, among routes whose every uphill step has a coupling remedy' },
  { key: 'openFlags', label: 'Open flags', basis: 'count', best: 'lowest', bestMeans: 'fewest' },
  { key: 'unresolvedComments', label: 'Unresolved comments', basis: 'count', best: 'lowest', bestMeans: 'fewest' },
  { key: 'status', label: 'Status', basis: '', best: 'approved', bestMeans: 'approved' },
  { key: 'updatedAt', label: 'Last edit', basis: '', best: 'none', bestMeans: 'not ranked' },
  { key: 'updatedBy', label: 'Edited by', basis: '', best: 'none', bestMeans: 'not ranked' },
];
