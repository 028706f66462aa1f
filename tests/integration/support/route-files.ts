import fs from 'node:fs';
import path from 'node:path';
import { isRefusedMethod } from '@/lib/api/method-not-allowed';

export const HTTP_METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;

/** The methods a route module serves itself; every file also exports refuseOtherMethods' 405 answers for the rest. */
export function servedMethods(mod: Record<string, unknown>): Array<(typeof HTTP_METHODS)[number]> {
  return HTTP_METHODS.filter((method) => typeof mod[method] === 'function' && !isRefusedMethod(mod[method]));
}

// Every app/api/**/route.ts, as a path relative to app/api (e.g. "teams/[teamId]/members").
export function listRouteFiles(root = path.resolve(__dirname, '../../../app/api')): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name === 'route.ts') found.push(path.relative(root, dir).split(path.sep).join('/'));
    }
  };
  walk(root);
  return found.sort();
}

export async function importRoute<T = Record<string, unknown>>(route: string): Promise<T> {
  const file = path.resolve(__dirname, '../../../app/api', route, 'route.ts');
  return (await import(/* @vite-ignore */ file)) as T;
}
