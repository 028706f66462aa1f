// Last check on every response: plain JSON numbers only. A NaN or Infinity here is an engine
// bug, never a user error, so it raises an internal error instead of reaching the client.

export class EngineInvariantError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'EngineInvariantError';
  }
}

function walk(value: unknown, path: string): void {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new EngineInvariantError(`non-finite number ${value} at ${path}`);
    return;
  }
  if (Array.isArray(value)) {
    value.forEach((v, i) => walk(v, `${path}[${i}]`));
    return;
  }
  if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) walk(v, `${path}.${k}`);
  }
}

export function assertFiniteNumbers<T>(value: T): T {
  walk(value, '$');
  return value;
}
