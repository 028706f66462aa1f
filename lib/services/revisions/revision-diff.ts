// A step-by-step comparison of two revisions of a route. Pure: no database.
import type { LinkInput, StepInput } from '../../schemas/route';
import type { RevisionState, RouteSnapshot } from './revision-snapshot';

export type FieldValue = string | number | boolean | { x: number; y: number } | null;

export interface FieldChange {
  field: string;
  from: FieldValue;
  to: FieldValue;
}

export interface DeltaGChange {
  from: number | null;
  to: number | null;
}

export interface StepPresence {
  id: string;
  equation: string;
  /** ΔG per mol of reaction as written */
  deltaG_kJ: number | null;
}

export interface StepChange {
  id: string;
  fields: FieldChange[];
  deltaG_kJ: DeltaGChange;
}

export interface RevisionDiff {
  route: FieldChange[];
  steps: { added: StepPresence[]; removed: StepPresence[]; changed: StepChange[] };
  links: { added: LinkInput[]; removed: LinkInput[] };
  overallDeltaG_kJ: DeltaGChange;
}

const ROUTE_FIELDS = ['name', 'target', 'targetAmount', 'marginalThreshold_kJ'] as const satisfies readonly (keyof RouteSnapshot)[];
const SCALAR_STEP_FIELDS = ['equation', 'temperature', 'standardPressure', 'heatCapacity', 'totalPressure', 'electrons', 'yieldPct', 'notes'] as const;
const MAP_STEP_FIELDS = ['pressures', 'concentrations', 'initial'] as const;

// Energies that agree to this many kJ are the same number written twice.
const ENERGY_EPSILON_KJ = 1e-9;

function sameEnergy(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) <= ENERGY_EPSILON_KJ;
}

function scalar(value: unknown): FieldValue {
  return value === undefined ? null : (value as FieldValue);
}

function stepFieldChanges(a: StepInput, b: StepInput): FieldChange[] {
  const changes: FieldChange[] = [];
  for (const field of SCALAR_STEP_FIELDS) {
    const from = scalar(a[field]);
    const to = scalar(b[field]);
    if (from !== to) changes.push({ field, from, to });
  }
  // Each species of a condition map is its own field ("pressures.CO(g)"), so one changed pressure reads as one change.
  for (const field of MAP_STEP_FIELDS) {
    const from = a[field] ?? {};
    const to = b[field] ?? {};
    for (const species of [...new Set([...Object.keys(from), ...Object.keys(to)])].sort()) {
      const f = scalar(from[species]);
      const t = scalar(to[species]);
      if (f !== t) changes.push({ field: `${field}.${species}`, from: f, to: t });
    }
  }
  if (a.position.x !== b.position.x || a.position.y !== b.position.y) changes.push({ field: 'position', from: { ...a.position }, to: { ...b.position } });
  return changes;
}

const linkKey = (l: LinkInput) => `${l.from}\u0000${l.to}\u0000${l.species}`;

function linkChanges(a: LinkInput[], b: LinkInput[]) {
  const before = new Set(a.map(linkKey));
  const after = new Set(b.map(linkKey));
  return { added: b.filter((l) => !before.has(linkKey(l))), removed: a.filter((l) => !after.has(linkKey(l))) };
}

const energy = (state: RevisionState, id: string) => state.stepDeltaG[id] ?? null;

export function diffRevisions(from: RevisionState, to: RevisionState): RevisionDiff {
  const a = from.snapshot;
  const b = to.snapshot;
  const route: FieldChange[] = ROUTE_FIELDS.filter((f) => a[f] !== b[f]).map((field) => ({ field, from: a[field], to: b[field] }));
  const before = new Map(a.steps.map((s) => [s.id, s]));
  const after = new Map(b.steps.map((s) => [s.id, s]));
  const added = b.steps.filter((s) => !before.has(s.id)).map((s) => ({ id: s.id, equation: s.equation, deltaG_kJ: energy(to, s.id) }));
  const removed = a.steps.filter((s) => !after.has(s.id)).map((s) => ({ id: s.id, equation: s.equation, deltaG_kJ: energy(from, s.id) }));
  const changed: StepChange[] = [];
  for (const next of b.steps) {
    const prev = before.get(next.id);
    if (!prev) continue;
    const fields = stepFieldChanges(prev, next);
    const deltaG_kJ = { from: energy(from, next.id), to: energy(to, next.id) };
    if (fields.length > 0 || !sameEnergy(deltaG_kJ.from, deltaG_kJ.to)) changed.push({ id: next.id, fields, deltaG_kJ });
  }
  return {
    route,
    steps: { added, removed, changed },
    links: linkChanges(a.links, b.links),
    overallDeltaG_kJ: { from: from.overallDeltaG_kJ, to: to.overallDeltaG_kJ },
  };
}

export function isEmptyDiff(diff: RevisionDiff): boolean {
  return (
    diff.route.length === 0 &&
    diff.steps.added.length + diff.steps.removed.length + diff.steps.changed.length === 0 &&
    diff.links.added.length + diff.links.removed.length === 0 &&
    sameEnergy(diff.overallDeltaG_kJ.from, diff.overallDeltaG_kJ.to)
  );
}

/** True when the only change is where steps sit on the board: dragging a node is not a revision of its own. */
export function isLayoutOnly(diff: RevisionDiff): boolean {
  if (diff.steps.changed.length === 0) return false;
  const steadyStep = diff.steps.changed.every((s) => s.fields.every((f) => f.field === 'position') && sameEnergy(s.deltaG_kJ.from, s.deltaG_kJ.to));
  return steadyStep && isEmptyDiff({ ...diff, steps: { ...diff.steps, changed: [] } });
}
