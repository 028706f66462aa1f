import Link from 'next/link';
import { ChemText } from '@/components/chemistry/chem-text';
import { formatKJ } from '@/lib/format/numbers';
import type { RouteImpact } from '@/lib/services/species/species-impact';

// To 0.1 kJ, the unit once after the arrow; a route the engine refuses has no value (and says so).
const change = (from: number | null, to: number | null, unit: string) =>
  from === null && to === null ? 'not evaluated' : `${from === null ? 'not evaluated' : formatKJ(from)} → ${to === null ? 'not evaluated' : formatKJ(to)} ${unit}`;

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
            <span className="text-ink-soft"> — route ΔG {change(r.overallBefore_kJ, r.overallAfter_kJ, 'kJ')}</span>
            <ul className="mt-1 flex flex-col gap-0.5 text-ink-soft">
              {r.steps.map((s) => (
                <li key={s.stepKey}>
                  <Link href={`/routes/${r.routeId}?step=${encodeURIComponent(s.stepKey)}`} className="text-pine-700 underline-offset-2 hover:underline">
                    <ChemText text={s.label ?? 'a step'} />
                  </Link>
                  : ΔG {change(s.before_kJ, s.after_kJ, 'kJ/mol')}
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
