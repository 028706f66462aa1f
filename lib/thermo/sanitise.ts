// Last check on every response: plain JSON numbers only. A NaN or Infinity here is an engine
// bug, never a user error, so it raises an internal error instead of reaching the client.

export class EngineInvariantError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'EngineInvariantError';
  }
}

const hasOwn = Object.prototype.hasOwnProperty;

// The fast pass builds no path strings; only a failure walks again to name where.
function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (value === null || typeof value !== 'object') return true;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) if (!allFinite(value[i])) return false;
    return true;
  }
  // for-in with an own-property test visits what Object.entries does, without allocating.
  const obj = value as Record<string, unknown>;
  for (const k in obj) if (hasOwn.call(obj, k) && !allFinite(obj[k])) return false;
  return true;
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
  if (!allFinite(value)) walk(value, '$');
  return value;
}
