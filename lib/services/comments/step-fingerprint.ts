import 'server-only';
import crypto from 'node:crypto';
import type { StepConditions } from '../../../db/models/step';

// Keys sorted at every level, so the same fields always give the same text.
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    entries.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value ?? null);
}

/**
 * A hash of what a step says: equation, conditions, yield and notes. The position is left out, so
 * moving a node on the board does not mark its comments as written on an earlier version.
 */
export function stepFingerprint(step: { equation: string; conditions: StepConditions; yieldPct: number; notes: string }): string {
  const text = canonical({ equation: step.equation, conditions: step.conditions ?? {}, yieldPct: step.yieldPct, notes: step.notes });
  return crypto.createHash('sha256').update(text).digest('hex');
}
