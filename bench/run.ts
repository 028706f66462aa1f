// npm run bench: every benchmark, side by side in one run; prints the figures and writes bench/results.json.
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { E2E_BASE_URL } from '../tests/e2e/support/e2e-env';
import { runEngineBench } from './engine.bench';
import { runLargeBench } from './large.bench';
import { runFirstLoadJsBench } from './first-load-js.bench';
import { runRouteEndpointBench } from './route-endpoint.bench';
import { splitFigures, type Figures } from './support/figures';
import { runThroughputBench } from './throughput.bench';

async function waitForHealth(url: string, timeoutMs = 240_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      if ((await fetch(`${url}/api/health`)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`the server at ${url} did not come up`);
}

async function withServer<T>(run: () => Promise<T>): Promise<T> {
  const server: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'scripts/e2e-server.ts'], { stdio: ['ignore', 'ignore', 'inherit'], detached: true });
  try {
    await waitForHealth(E2E_BASE_URL);
    return await run();
  } finally {
    if (server.pid) process.kill(-server.pid, 'SIGTERM');
  }
}

async function section(name: string, results: Record<string, Figures>, run: () => Promise<Figures>) {
  const started = Date.now();
  try {
    results[name] = await run();
  } catch (error) {
    console.error(`[bench] ${name} failed:`, error);
    results[name] = { failed: 1 };
  }
  console.log(`[bench] ${name} (${((Date.now() - started) / 1000).toFixed(1)} s)`, results[name]);
}

async function main() {
  const results: Record<string, Figures> = {};
  await section('engine', results, runEngineBench);
  const optional = async (file: string, exportName: string, ...args: unknown[]): Promise<Figures> => {
    const mod = (await import(path.resolve(__dirname, file))) as Record<string, (...a: unknown[]) => Promise<Figures>>;
    return mod[exportName]!(...args);
  };
  await section('route (in-process)', results, () => optional('route.bench.ts', 'runRouteBench'));
  await section('species by structure', results, () => optional('structure.bench.ts', 'runStructureBench'));
  await section('species search', results, () => optional('species-search.bench.ts', 'runSpeciesSearchBench'));
  await section('JS budget (build output)', results, () => optional('js-budget.ts', 'runJsBudget'));
  await withServer(async () => {
    await section('route endpoint (HTTP)', results, () => runRouteEndpointBench(E2E_BASE_URL));
    await section('compare endpoint (HTTP)', results, () => optional('compare.bench.ts', 'runCompareBench', E2E_BASE_URL));
    await section('editor drag (Chromium)', results, () => optional('editor-drag.bench.ts', 'runEditorDragBench', E2E_BASE_URL));
    await section('evaluate throughput (autocannon)', results, () => runThroughputBench(E2E_BASE_URL));
    await section('first-load JS (build output)', results, () => runFirstLoadJsBench(E2E_BASE_URL));
    await section('large team (HTTP)', results, () => runLargeBench(E2E_BASE_URL));
  });
  const split = splitFigures(results);
  const out = { machine: `${process.platform} ${process.arch}, node ${process.version}`, ranAt: new Date().toISOString(), ...split };
  fs.writeFileSync(path.resolve(__dirname, 'results.json'), `${JSON.stringify(out, null, 2)}\n`);
  console.log('\nfigure | value');
  for (const [name, figures] of Object.entries(split.results)) for (const [k, v] of Object.entries(figures)) console.log(`${name} · ${k} | ${v}`);
  console.log('\ncontext (counts, one-off timings, raw rates; not in the table)');
  for (const [name, figures] of Object.entries(split.context)) for (const [k, v] of Object.entries(figures)) console.log(`${name} · ${k} | ${v}`);
  const failed = Object.values(results).some((f) => f.failed);
  process.exit(failed ? 1 : 0);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
