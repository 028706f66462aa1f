'use client';

import Link from 'next/link';
import { CompareLadder, sharedDomain, type LadderBasis } from '@/components/compare/compare-ladder';
import { CompareStepList } from '@/components/compare/compare-step-list';
import { MetricsTable } from '@/components/compare/metrics-table';
import type { MetricUnits } from '@/components/compare/metric-format';
import { StatusBadge } from '@/components/review/status-badge';
import { ScrollRegion } from '@/components/tables/scroll-region';
import type { Comparison, MetricKey } from '@/lib/compare/compare-types';

/** Step ids of each route that share an equation with another compared route. */
export function sharedStepIds(comparison: Comparison): Map<number, Set<string>> {
  const out = new Map<number, Set<string>>();
  for (const shared of comparison.sharedEquations) {
    for (const { routeId, stepIds } of shared.routes) {
      const set = out.get(routeId) ?? new Set<string>();
      for (const id of stepIds) set.add(id);
      out.set(routeId, set);
    }
  }
  return out;
}

// The ladders on one scale and the metrics table; used by the compare page and the printable report.
export function CompareView({
  comparison,
  basis,
  units,
  visible,
  isPrint = false,
}: {
  comparison: Comparison;
  basis: LadderBasis;
  units: MetricUnits;
  visible: ReadonlySet<MetricKey>;
  /** the printable report */
  isPrint?: boolean;
}) {
  const domain = sharedDomain(
    comparison.routes.map((r) => r.ladder),
    basis,
  );
  const shared = sharedStepIds(comparison);
  const cols = comparison.routes.length <= 2 ? 'md:grid-cols-2' : comparison.routes.length === 3 ? 'md:grid-cols-3' : 'md:grid-cols-2 xl:grid-cols-4';
  return (
    <div className="flex flex-col gap-4">
      <div className={`grid grid-cols-1 gap-3 ${cols}`}>
        {comparison.routes.map((route) => (
          <figure key={route.id} className="compare-card flex flex-col gap-1 rounded-lg border border-paper-edge bg-white p-2" aria-label={`Ladder of ${route.name}`}>
            <figcaption className="flex flex-wrap items-center justify-between gap-1 text-sm">
              <Link href={`/routes/${route.id}`} className="font-semibold text-pine-700 hover:underline">
                {route.name}
              </Link>
              <StatusBadge status={route.status} />
            </figcaption>
            {route.ladder ? (
              <CompareLadder name={route.name} ladder={route.ladder} domain_kJ={domain} basis={basis} unit={units.energyUnit} sharedStepIds={shared.get(route.id) ?? new Set()} />
            ) : (
              <p role="alert" className="text-sm text-uphill">
                Could not evaluate this route: {route.error?.message ?? 'unknown reason'}.
              </p>
            )}
            {route.ladder ? <CompareStepList ladder={route.ladder} sharedStepIds={shared.get(route.id) ?? new Set()} unit={units.energyUnit} isPrint={isPrint} /> : null}
          </figure>
        ))}
      </div>
      <p className="text-xs text-ink-faint">
        Every ladder uses the same scale, per mol of target. Shaded bands and “(shared)” mark steps with the same equation in more than one route. Uphill risers are hatched, marginal ones dotted. Under each step, where its values came from: ■ library (with its source), ◇ team (with its provenance), ◌ estimate (method and σ).
      </p>
      <ScrollRegion label="Metrics of the compared routes" className="rounded-lg border border-paper-edge bg-white p-2">
        <MetricsTable comparison={comparison} units={units} visible={visible} caption="Compared routes, one column each" />
      </ScrollRegion>
    </div>
  );
}
