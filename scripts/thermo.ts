// CLI: `npm run -s thermo -- evaluate|fit` reads one request (or an array) as JSON on stdin
// and writes one response each as pretty JSON. A failing item becomes {"error": {...}} in place.
// Exit 0; exit 2 when stdin is not JSON or the subcommand is unknown.
import { EvaluateRequestSchema } from '../lib/schemas/evaluate';
import { FitRequestSchema } from '../lib/schemas/fit';
import { evaluateStep, isThermoError, runFit } from '../lib/thermo';
import type { z } from 'zod';

const USAGE = `usage: npm run -s thermo -- <evaluate|fit> < request.json
  evaluate  thermodynamics of one reaction step (see lib/schemas/evaluate.ts)
  fit       van 't Hoff fit of ln K against 1/T (see lib/schemas/fit.ts)
stdin holds one request object or an array of them.`;

interface ErrorBody {
  error: { code: string; message: string; field?: string; hint?: string; details?: Record<string, unknown> };
}

function errorBody(err: unknown): ErrorBody {
  if (isThermoError(err)) {
    return {
      error: {
        code: err.code,
        message: err.message,
        ...(err.field !== undefined ? { field: err.field } : {}),
        ...(err.hint !== undefined ? { hint: err.hint } : {}),
        ...(err.details !== undefined ? { details: err.details } : {}),
      },
    };
  }
  return { error: { code: 'INTERNAL', message: err instanceof Error ? err.message : String(err) } };
}

function runOne<S extends z.ZodType>(schema: S, run: (req: z.infer<S>) => unknown, item: unknown): unknown {
  const parsed = schema.safeParse(item);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const path = issue ? issue.path.map(String) : [];
    // An unknown key is reported on the key itself, not on its parent object.
    if (issue?.code === 'unrecognized_keys' && issue.keys[0] !== undefined) path.push(issue.keys[0]);
    const field = path.join('.');
    return { error: { code: 'VALIDATION', message: issue ? `${field || 'request'}: ${issue.message}` : 'invalid request', field } };
  }
  try {
    return run(parsed.data);
  } catch (err) {
    return errorBody(err);
  }
}

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

async function main(): Promise<number> {
  const command = process.argv[2];
  const handlers: Record<string, (item: unknown) => unknown> = {
    evaluate: (item) => runOne(EvaluateRequestSchema, (r) => evaluateStep(r), item),
    fit: (item) => runOne(FitRequestSchema, (r) => runFit(r), item),
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
