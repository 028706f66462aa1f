// CLI: `npm run -s thermo -- evaluate|fit|route` reads one request (or an array) as JSON on stdin
// and writes one response each as pretty JSON. A failing item becomes {"error": {...}} in place.
// Exit 0; exit 2 when stdin is not JSON or the subcommand is unknown.
import { EvaluateRequestSchema } from '../lib/schemas/evaluate';
import { FitRequestSchema } from '../lib/schemas/fit';
import { SpeciesResolveSchema } from '../lib/schemas/species-resolve';
import { builtinLookup, evaluateStep, runFit } from '../lib/thermo';
import { runItem } from '../lib/thermo/batch';
import { evaluateRoute, RouteEvaluateRequestSchema } from '../lib/thermo/route';
import { loadChem } from '../lib/thermo/structure/chem';
import { describeSpecies } from '../lib/thermo/structure/species-answer';
import { structureLookup } from '../lib/thermo/structure/structure-lookup';

const USAGE = `usage: npm run -s thermo -- <evaluate|fit|route|species> < request.json
  evaluate  thermodynamics of one reaction step (see lib/schemas/evaluate.ts)
  species   one species by SMILES, name or key: identity, source or estimate, values at T (lib/schemas/species-resolve.ts)
  fit       van 't Hoff fit of ln K against 1/T (see lib/schemas/fit.ts)
  route     every step of a route, its free-energy ladder and remedies (see lib/schemas/route-evaluate.ts)
stdin holds one request object or an array of them.`;

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

async function main(): Promise<number> {
  const command = process.argv[2];
  // The built-in library, known by structure, with the estimator behind it (no team species on the command line).
  const lookup = structureLookup(builtinLookup, await loadChem());
  const handlers: Record<string, (item: unknown) => unknown> = {
    evaluate: (item) => runItem(EvaluateRequestSchema, (r) => evaluateStep(r, { lookup }), item),
    fit: (item) => runItem(FitRequestSchema, (r) => runFit(r), item),
    route: (item) => runItem(RouteEvaluateRequestSchema, (r) => evaluateRoute(r, { lookup }), item),
    species: (item) => runItem(SpeciesResolveSchema, (r) => describeSpecies(lookup, r), item),
  };
  const handler = command === undefined ? undefined : handlers[command];
  if (!handler) {
    process.stderr.write(`${command === undefined ? 'missing subcommand' : `unknown subcommand "${command}"`}\n${USAGE}\n`);
    return 2;
  }
  let input: unknown;
  try {
    input = JSON.parse(await readStdin());
  } catch (err) {
    process.stderr.write(`stdin is not JSON: ${err instanceof Error ? err.message : String(err)}\n${USAGE}\n`);
    return 2;
  }
  const output = Array.isArray(input) ? input.map(handler) : handler(input);
  process.stdout.write(`${JSON.stringify(output, null, 2)}\n`);
  return 0;
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    process.stderr.write(`${err instanceof Error ? err.stack ?? err.message : String(err)}\n`);
    process.exitCode = 1;
  },
);
