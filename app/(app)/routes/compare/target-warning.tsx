import { Fragment } from 'react';
import { FormulaText } from '@/components/chemistry/formula-text';
import { Notice } from '@/components/ui/notice';
import { differentTargets } from '@/lib/compare/target-groups';

// Said near the top of the comparison and its report: figures per mol of target do not compare across targets.
export function TargetWarning({ routes }: { routes: ReadonlyArray<{ name: string; target: string }> }) {
  const groups = differentTargets(routes);
  if (!groups) return null;
  return (
    <div data-testid="target-warning">
      <Notice tone="caution" title="These routes make different targets">
        {groups.map((g, i) => (
          <Fragment key={g.target}>
            {i > 0 ? '; ' : ''}
            {g.routeNames.map((n) => `“${n}”`).join(' and ')} {g.routeNames.length === 1 ? 'makes' : 'make'} <FormulaText value={g.target} />
          </Fragment>
        ))}
        . Every figure here is per mol of each route’s own target, so the totals and the ranking do not compare like with like.
      </Notice>
    </div>
  );
}
