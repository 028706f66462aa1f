// Engine benchmark: prints figures, asserts nothing. Run: npx tsx bench/engine.bench.ts
// Step evaluations (median, p95 µs after warm-up; the first, cold call; and with the memos
// emptied before every call), species lookup (ns/op) at library size and at 10× that size,
// and the one-off cost of loading and indexing the library.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { EvaluateRequest } from '../lib/schemas/evaluate';
import type { SpeciesLibraryFile, SpeciesRecord } from '../lib/thermo/species-types';

const WARMUP = 2000;
const RUNS = 5000;
const MISS_RUNS = 500;
const LOOKUPS = 2_000_000;

const TYPICAL: Record<string, EvaluateRequest> = {
  combustion_298K: { equation: 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)' },
  shift_800K_conditions: {
    equation: 'CO(g) + H2O(g) <=> CO2(g) + H2(g)',
    temperature: '800 K',
    pressures: { 'CO(g)': '2 bar', 'H2O(g)': '3 bar', 'CO2(g)': '1 bar', 'H2(g)': '1 bar' },
  },
  ammonia_700K_equilibrium: {
    equation: 'N2(g) + 3 H2(g) <=> 2 NH3(g)',
    temperature: '700 K',
    initial: { 'N2(g)': '1 mol', 'H2(g)': '3 mol' },
    totalPressure: '200 bar',
  },
  acetate_aqueous: {
    equation: 'CH3COOH(aq) <=> CH3COO-(aq) + H+(aq)',
    concentrations: { 'CH3COOH(aq)': '0.1 mol/L', 'CH3COO-(aq)': '0.01 mol/L', 'H+(aq)': '1e-4 mol/L' },
  },
};

function quantile(sorted: number[], q: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.round(q * (sorted.length - 1))));
  return sorted[i]!;
}

function timeCall(fn: () => unknown): number {
  const t0 = process.hrtime.bigint();
  fn();
  return Number(process.hrtime.bigint() - t0) / 1000;
}

function timeLookups(get: (k: string) => unknown, keys: string[]): number {
  let hits = 0;
  const t0 = process.hrtime.bigint();
  for (let i = 0; i < LOOKUPS; i++) if (get(keys[i % keys.length]!) !== undefined) hits++;
  const ns = Number(process.hrtime.bigint() - t0) / LOOKUPS;
  if (hits !== LOOKUPS) throw new Error('lookup benchmark missed keys');
  return ns;
}

export async function runEngineBench(): Promise<Record<string, number>> {
  const figures: Record<string, number> = {};

  const tImport = performance.now();
  const lib = await import('../lib/thermo/species-library');
  figures.library_first_import_ms = performance.now() - tImport;

  const tIndex = performance.now();
  const file = JSON.parse(
    readFileSync(path.resolve(__dirname, '../lib/thermo/data/species-library.json'), 'utf8'),
  ) as SpeciesLibraryFile;
  const fresh = lib.layeredLookup(file.species, lib.builtinLookup);
  figures.library_parse_and_index_ms = performance.now() - tIndex;
  if (!fresh.get('H2O(l)')) throw new Error('index build failed');

  const tEngine = performance.now();
  const { evaluateStep } = await import('../lib/thermo/evaluate');
  const { clearReactionMemo } = await import('../lib/thermo/resolve-reaction');
  figures.engine_first_import_ms = performance.now() - tEngine;

  // First call of each request: nothing memoised yet, and the very first one also runs cold code.
  for (const [name, req] of Object.entries(TYPICAL)) figures[`${name}_first_call_us`] = timeCall(() => evaluateStep(req, { lookup: lib.builtinLookup }));

  for (const [name, req] of Object.entries(TYPICAL)) {
    for (let i = 0; i < WARMUP; i++) evaluateStep(req, { lookup: lib.builtinLookup });
    const samples: number[] = [];
    for (let i = 0; i < RUNS; i++) samples.push(timeCall(() => evaluateStep(req, { lookup: lib.builtinLookup })));
    samples.sort((a, b) => a - b);
    figures[`${name}_median_us`] = quantile(samples, 0.5);
    figures[`${name}_p95_us`] = quantile(samples, 0.95);
  }

  // Warm code, empty memos: what a never-seen equation costs (parse, balance, crossover search).
  for (const [name, req] of Object.entries(TYPICAL)) {
    const samples: number[] = [];
    for (let i = 0; i < MISS_RUNS; i++) {
      clearReactionMemo();
      samples.push(timeCall(() => evaluateStep(req, { lookup: lib.builtinLookup })));
    }
    samples.sort((a, b) => a - b);
    figures[`${name}_memo_miss_median_us`] = quantile(samples, 0.5);
  }

  // Same code path, map of library size vs ten times that (synthetic keys).
  const base = lib.builtinSpecies();
  const synthetic: SpeciesRecord[] = [];
  for (let copy = 0; copy < 10; copy++) for (const r of base) synthetic.push({ ...r, key: `${r.key}#${copy}` });
  const small = lib.layeredLookup(base, lib.builtinLookup);
  const large = lib.layeredLookup(synthetic, lib.builtinLookup);
  const smallKeys = base.map((r) => r.key);
  const largeKeys = synthetic.map((r) => r.key);
  timeLookups((k) => small.get(k), smallKeys);
  figures.lookup_library_size_ns_per_op = timeLookups((k) => small.get(k), smallKeys);
  figures.lookup_10x_size_ns_per_op = timeLookups((k) => large.get(k), largeKeys);
  figures.library_species = base.length;
  figures.synthetic_species = synthetic.length;
  return figures;
}

if (process.argv[1] !== undefined && /engine\.bench\.ts$/.test(process.argv[1])) {
  runEngineBench().then(
    (figures) => {
      for (const [k, v] of Object.entries(figures)) console.log(`${k.padEnd(40)} ${v.toFixed(v < 10 ? 3 : 1)}`);
    },
    (err: unknown) => {
      console.error(err);
      process.exitCode = 1;
    },
  );
}
