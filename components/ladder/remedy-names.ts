// Remedies come from the engine with species by key; a species known by structure has a key such as
// "{KWOLFJPFCHCOCG-UHFFFAOYSA-N}(aq)". The panel writes it as the step writes it ("ketone"), so the sentences read,
// and an applied change lands on the label the step's species map already defines instead of a second entry.
import type { ConditionMapsOut, Remedy, RouteStepResult } from '@/lib/thermo/route';

type Written = Map<string, string>;

function writtenNames(result: RouteStepResult['result']): Written {
  const out: Written = new Map();
  for (const s of result?.species ?? []) if (s.key.startsWith('{') && s.as_written) out.set(s.key, s.as_written);
  return out;
}

function rewrite(text: string, names: Written): string {
  let out = text;
  for (const [key, written] of names) out = out.split(key).join(written);
  return out;
}

function rewriteMap(map: Record<string, string> | undefined, names: Written): Record<string, string> | undefined {
  return map ? Object.fromEntries(Object.entries(map).map(([k, v]) => [names.get(k) ?? k, v])) : undefined;
}

function rewriteConditions(c: ConditionMapsOut | null, names: Written): ConditionMapsOut | null {
  if (!c) return c;
  const pressures = rewriteMap(c.pressures, names);
  const concentrations = rewriteMap(c.concentrations, names);
  return { ...(pressures ? { pressures } : {}), ...(concentrations ? { concentrations } : {}) };
}

/** A sentence of the engine about this step (a warning, a note) with structure keys written as in the step. */
export function textAsWritten(text: string, result: RouteStepResult['result']): string {
  const names = writtenNames(result);
  return names.size === 0 ? text : rewrite(text, names);
}

/** The step's remedies with structure keys written as in the step; unchanged when it has none. */
export function remediesAsWritten(step: Pick<RouteStepResult, 'result' | 'remedies'>): Remedy[] {
  const names = writtenNames(step.result);
  if (names.size === 0) return step.remedies;
  return step.remedies.map((r): Remedy => {
    if (r.kind === 'conditions') {
      return { ...r, summary: rewrite(r.summary, names), species: r.species === null ? null : (names.get(r.species) ?? r.species), conditions: rewriteConditions(r.conditions, names) };
    }
    if (r.kind === 'coupling') {
      return { ...r, summary: rewrite(r.summary, names), note: rewrite(r.note, names), combinedEquation: rewrite(r.combinedEquation, names), conditions: rewriteConditions(r.conditions, names) };
    }
    return { ...r, summary: rewrite(r.summary, names) };
  });
}
