import { ChemText } from '@/components/chemistry/chem-text';
import { relabelStepIds, type StepLabel } from '@/lib/route-editor/step-label';
import type { RouteWarning } from '@/lib/thermo/route';

// The engine names steps by id; people know them as "Step n (what it does)".
function withLabels(message: string, stepLabels: Record<string, string>): string {
  const labels = new Map<string, StepLabel>(Object.entries(stepLabels).map(([id, full], i) => [id, { number: i + 1, short: full, full }]));
  return relabelStepIds(message, labels);
}

export function RouteWarnings({
  warnings,
  stepLabels,
  error,
  hasEarlierResult = false,
}: {
  warnings: RouteWarning[];
  stepLabels: Record<string, string>;
  error: Error | null;
  /** an earlier answer is on screen: only then may the message say so */
  hasEarlierResult?: boolean;
}) {
  if (!error && warnings.length === 0) return null;
  return (
    <section aria-labelledby="route-warnings-heading" className="rounded-md border border-marginal/40 bg-marginal-bg px-3 py-2 text-sm text-ink">
      <h2 id="route-warnings-heading" className="font-semibold text-marginal">
        <span aria-hidden="true">⚠ </span>Route warnings
      </h2>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        {error ? (
          <li>
            The route could not be evaluated: <ChemText text={withLabels(error.message, stepLabels)} />
            {hasEarlierResult ? ' (the figures shown are from the last evaluation that worked).' : '.'}
          </li>
        ) : null}
        {warnings.map((w, i) => (
          <li key={`${w.code}-${i}`}>
            <ChemText text={withLabels(w.message, stepLabels)} />
          </li>
        ))}
      </ul>
    </section>
  );
}
