import type { FitResult } from '@/lib/fits/analyse-fit';

const n = (x: number, d = 4) => Number(x.toPrecision(d)).toString();

/** ΔH° and ΔS° with their standard errors, R², n, and what the numbers do and do not say. */
export function FitSummary({ result }: { result: FitResult }) {
  return (
    <div className="flex flex-col gap-2">
      <dl className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4">
        <div>
          <dt className="text-ink-soft">ΔH°</dt>
          <dd className="font-medium tabular-nums">
            {n(result.deltaH0_kJ)} ± {n(result.stderr_deltaH0_kJ, 2)} kJ/mol
          </dd>
        </div>
        <div>
          <dt className="text-ink-soft">ΔS°</dt>
          <dd className="font-medium tabular-nums">
            {n(result.deltaS0_J_per_K)} ± {n(result.stderr_deltaS0_J_per_K, 2)} J/(mol K)
          </dd>
        </div>
        <div>
          <dt className="text-ink-soft">R²</dt>
          <dd className="font-medium tabular-nums">{result.r2.toFixed(5)}</dd>
        </div>
        <div>
          <dt className="text-ink-soft">Points</dt>
          <dd className="font-medium tabular-nums">
            n = {result.n}, {n(result.range_K[0])}–{n(result.range_K[1])} K
          </dd>
        </div>
      </dl>
      <p className="text-xs text-ink-soft">
        ± is one standard error, {result.weighted ? 'from the σ given with each point (weighted fit)' : 'from the scatter about the line (no σ given)'}. The
        values hold over the fitted temperatures with ΔCp taken as zero. A thermodynamic screen says nothing of rates, runaway or toxicity.
      </p>
    </div>
  );
}
