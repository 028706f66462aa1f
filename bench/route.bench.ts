// Route benchmark: prints figures, asserts nothing. Run: npx tsx bench/route.bench.ts
// evaluateRoute on a 200-step synthetic chain (median, p95 ms after warm-up): half the steps uphill
// with every remedy worked out (cold: a species lookup of its own each run, so no memo helps), the
// same after one edit (one step's temperature changed, the editor's pattern), and every step downhill.
import { builtinLookup, layeredLookup } from '../lib/thermo';
import type { RouteEvaluateRequest, RouteStep } from '../lib/thermo/route';

const STEPS = 200;
const WARMUP = 5;
const RUNS = 30;

function quantile(sorted: number[], q: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.round(q * (sorted.length - 1))));
  return sorted[i]!;
}

/** NH4Cl decomposed (uphill below ~590 K) and re-formed, alternately; every step at a temperature of its own. */
function mixedChain(): RouteEvaluateRequest {
  const steps: RouteStep[] = [];
  const links: NonNullable<RouteEvaluateRequest['links']> = [];
  for (let i = 0; i < STEPS; i++) {
    const id = `s${i}`;
    const temperature = `${(300 + i * 1.3).toFixed(2)} K`;
    if (i % 2 === 0) {
      steps.push({ id, equation: 'NH4Cl(s) -> NH3(g) + HCl(g)', temperature, yield: 0.98 });
      links.push({ from: id, to: `s${i + 1}`, species: 'NH3(g)' }, { from: id, to: `s${i + 1}`, species: 'HCl(g)' });
    } else {
      steps.push({ id, equation: 'NH3(g) + HCl(g) -> NH4Cl(s)', temperature, pressures: { 'NH3(g)': '0.5 bar', 'HCl(g)': '0.5 bar' } });
      if (i + 1 < STEPS) links.push({ from: id, to: `s${i + 1}`, species: 'NH4Cl(s)' });
    }
  }
  return { target: 'NH4Cl(s)', steps, links };
}

/** Every step downhill: CO2 captured by quicklime, then released by HCl (net CaO + 2 HCl → CaCl2 + H2O). */
function downhillChain(): RouteEvaluateRequest {
  const steps: RouteStep[] = [];
  const links: NonNullable<RouteEvaluateRequest['links']> = [];
  for (let i = 0; i < STEPS; i++) {
    const id = `s${i}`;
    const capture = i % 2 === 0;
    steps.push({ id, equation: capture ? 'CaO(s) + CO2(g) -> CaCO3(s)' : 'CaCO3(s) + 2 HCl(g) -> CaCl2(s) + H2O(l) + CO2(g)' });
    if (i + 1 < STEPS) links.push({ from: id, to: `s${i + 1}`, species: capture ? 'CaCO3(s)' : 'CO2(g)' });
  }
  return { target: 'CaCl2(s)', steps, links };
}

type Run = (i: number) => void;

function editOne(request: RouteEvaluateRequest, i: number): RouteEvaluateRequest {
  const k = (i * 37) % request.steps.length;
  return { ...request, steps: request.steps.map((s, j) => (j === k ? { ...s, temperature: `${350 + (i % 80)}.5 K` } : s)) };
}

async function time(name: string, run: Run, figures: Record<string, number>): Promise<void> {
  for (let i = 0; i < WARMUP; i++) run(i);
  const samples: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = process.hrtime.bigint();
    run(WARMUP + i);
    samples.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  samples.sort((a, b) => a - b);
  figures[`${name}_median_ms`] = quantile(samples, 0.5);
  figures[`${name}_p95_ms`] = quantile(samples, 0.95);
}

export async function runRouteBench(): Promise<Record<string, number>> {
  const { evaluateRoute } = await import('../lib/thermo/route');
  const figures: Record<string, number> = {};
  const mixed = mixedChain();
  const downhill = downhillChain();
  await time('route_200_mixed_cold', () => evaluateRoute(mixed, { lookup: layeredLookup([]) }), figures);
  await time('route_200_mixed_after_edit', (i) => evaluateRoute(editOne(mixed, i), { lookup: builtinLookup }), figures);
  await time('route_200_downhill', () => evaluateRoute(downhill, { lookup: builtinLookup }), figures);
  figures.route_steps = STEPS;
  return figures;
}

if (process.argv[1] !== undefined && /route\.bench\.ts$/.test(process.argv[1])) {
  runRouteBench().then(
    (figures) => {
      for (const [k, v] of Object.entries(figures)) console.log(`${k.padEnd(40)} ${v.toFixed(v < 10 ? 3 : 1)}`);
    },
    (err: unknown) => {
      console.error(err);
      process.exitCode = 1;
    },
  );
}
