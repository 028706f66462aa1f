import Link from 'next/link';
import { formatNumber } from '@/components/tables/species-columns';
import type { RouteImpact } from '@/lib/services/species/species-impact';

const kj = (x: number | null) => (x === null ? 'no value' : `${formatNumber(x, 2)} kJ`);

/** The routes whose ΔG an edit changes (or would change), step by step. */
export function RouteImpactList({ impact, done }: { impact: RouteImpact[]; done: boolean }) {
  if (impact.length === 0) {
    return <p className="text-sm text-ink-soft">{done ? 'No route of your team changed its ΔG.' : 'No route of your team would change its ΔG.'}</p>;
  }
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm font-medium">
        {impact.length} route{impact.length > 1 ? 's' : ''} {done ? (impact.length > 1 ? 'now have' : 'now has') : 'would get'} different ΔG values:
      </p>
      <ul className="flex flex-col gap-2 text-sm">
        {impact.map((r) => (
          <li key={r.routeId} className="rounded-md border border-paper-edge bg-white px-3 py-2">
            <Link href={`/routes/${r.routeId}`} className="font-medium text-pine-700 underline-offset-2 hover:underline">{r.routeName}</Link>
            <span className="text-ink-soft"> — overall {kj(r.overallBefore_kJ)} → {kj(r.overallAfter_kJ)}</span>
            <ul className="mt-1 flex flex-col gap-0.5 text-ink-soft">
              {r.steps.map((s) => (
                <li key={s.stepKey}>
                  step <Link href={`/routes/${r.routeId}?step=${encodeURIComponent(s.stepKey)}`} className="text-pine-700 underline-offset-2 hover:underline">{s.stepKey}</Link>: ΔG {kj(s.before_kJ)} → {kj(s.after_kJ)}
                </li>
              ))}
            </ul>
          </li>
        ))}
      </ul>
      <p className="text-xs text-ink-faint">A route’s ΔG in the routes list is the one saved with it; it follows the new values the next time the route is saved.</p>
    </div>
  );
}
