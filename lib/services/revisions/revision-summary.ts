// One short line saying what a save changed, e.g. "+1 step, T of Step 2 (water–gas shift) 500 → 650 K, ΔG overall
// −12.4 → −20.1 kJ". Steps are named by their place in route order and what they do, never by id. Pure.
import { formatKJ, formatSignificant, MINUS, withTrueMinus } from '../../format/numbers';
import { stepLabels } from '../../route-editor/step-label';
import { diffRevisions, type FieldChange, type FieldValue, type RevisionDiff } from './revision-diff';
import type { RevisionState } from './revision-snapshot';

export const MAX_SUMMARY_LENGTH = 240;

const signed = withTrueMinus;

export function formatKj(value: number): string {
  return formatKJ(value);
}

/** How a summary names a step: its full label ("Step 2 (water–gas shift)"), or the id where none is known. */
export type StepNamer = (id: string) => string;
const byId: StepNamer = (id) => id;

const QUANTITY = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*)$/;

// A number as typed, unless it was typed in e-notation ("1e-7"): that reads "10⁻⁷".
const number = (typed: string) => (/e/i.test(typed) ? formatSignificant(Number(typed), 3) : signed(typed));

function text(value: FieldValue): string {
  if (value === null) return '—';
  if (typeof value === 'object') return `(${value.x}, ${value.y})`;
  const q = typeof value === 'string' ? QUANTITY.exec(value) : null;
  if (q && /e/i.test(q[1]!)) return `${number(q[1]!)}${q[2] ? ` ${q[2]}` : ''}`;
  return signed(String(value));
}

// "500 K" → "650 K" reads as "500 → 650 K" when the unit is the same.
function arrow(from: FieldValue, to: FieldValue): string {
  if (typeof from === 'string' && typeof to === 'string') {
    const a = QUANTITY.exec(from);
    const b = QUANTITY.exec(to);
    if (a && b && a[2] === b[2] && a[2] !== '') return `${number(a[1]!)} → ${number(b[1]!)} ${a[2]}`;
  }
  return `${text(from)} → ${text(to)}`;
}

const LABELS: Record<string, string> = {
  temperature: 'T',
  standardPressure: 'standard state',
  totalPressure: 'total P',
  electrons: 'n(e⁻)',
  yieldPct: 'yield',
  heatCapacity: 'Cp correction',
};

function stepFieldPart(id: string, change: FieldChange, name: StepNamer): string {
  const { field, from, to } = change;
  const stepId = name(id);
  if (field === 'equation') return `equation of ${stepId} changed`;
  if (field === 'notes') return `notes of ${stepId} edited`;
  if (field === 'heatCapacity') return `Cp correction of ${stepId} ${to ? 'on' : 'off'}`;
  const dot = field.indexOf('.');
  const label =
    dot > 0 ? `${{ pressures: 'p', concentrations: 'c', initial: 'initial' }[field.slice(0, dot)] ?? field.slice(0, dot)}(${field.slice(dot + 1)})` : (LABELS[field] ?? field);
  if (from === null) return `${label} of ${stepId} set to ${text(to)}`;
  if (to === null) return `${label} of ${stepId} cleared`;
  if (field === 'yieldPct') return `${label} of ${stepId} ${text(from)} → ${text(to)} %`;
  return `${label} of ${stepId} ${arrow(from, to)}`;
}

function routeFieldPart(change: FieldChange): string {
  const { field, from, to } = change;
  if (field === 'name') return `renamed "${text(from)}" → "${text(to)}"`;
  if (field === 'targetAmount') return `amount ${arrow(from, to)}`;
  if (field === 'marginalThreshold_kJ') return `threshold ${text(from)} → ${text(to)} kJ`;
  return `${field} ${text(from)} → ${text(to)}`;
}

const count = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

export function summaryParts(diff: RevisionDiff, name: StepNamer = byId): string[] {
  const parts = diff.route.map(routeFieldPart);
  if (diff.steps.added.length) parts.push(`+${count(diff.steps.added.length, 'step')}`);
  if (diff.steps.removed.length) parts.push(`${MINUS}${count(diff.steps.removed.length, 'step')}`);
  let moved = 0;
  for (const step of diff.steps.changed) {
    for (const change of step.fields) {
      if (change.field === 'position') moved += 1;
      else parts.push(stepFieldPart(step.id, change, name));
    }
  }
  // Layout is not chemistry: a move rides along with the next real change and is only counted.
  if (moved) parts.push(`${count(moved, 'step')} moved on the board`);
  if (diff.links.added.length) parts.push(`+${count(diff.links.added.length, 'link')}`);
  if (diff.links.removed.length) parts.push(`${MINUS}${count(diff.links.removed.length, 'link')}`);
  const { from, to } = diff.overallDeltaG_kJ;
  if (from !== null && to !== null && formatKj(from) !== formatKj(to)) parts.push(`ΔG overall ${formatKj(from)} → ${formatKj(to)} kJ`);
  else if (from === null && to !== null) parts.push(`ΔG overall now ${formatKj(to)} kJ`);
  else if (from !== null && to === null) parts.push('ΔG overall no longer evaluated');
  return parts;
}

// Adds parts while they fit, then says how many were left out; never longer than the cap.
export function joinCapped(head: string, parts: string[], cap = MAX_SUMMARY_LENGTH): string {
  if (parts.length === 0) return head.length <= cap ? head : `${head.slice(0, cap - 1)}…`;
  const lead = head ? `${head}: ` : '';
  let out = '';
  for (let i = 0; i < parts.length; i += 1) {
    const next = out ? `${out}, ${parts[i]}` : parts[i]!;
    const rest = parts.length - i - 1;
    const tail = rest > 0 ? `, +${rest} more` : '';
    if ((lead + next + tail).length > cap) {
      const more = `+${parts.length - i} more`;
      const line = out ? `${lead}${out}, ${more}` : `${lead}${more}`;
      return line.length <= cap ? line : `${line.slice(0, cap - 1)}…`;
    }
    out = next;
  }
  return lead + out;
}

/** `previous` is null for a route's first revision; `head` names how it came about ("Created", "Restored revision 3"). */
export function summariseRevision(previous: RevisionState | null, next: RevisionState, head = ''): string {
  if (!previous) return joinCapped(head || 'Saved', []);
  const labels = stepLabels(next.snapshot.steps, next.snapshot.links);
  const parts = summaryParts(diffRevisions(previous, next), (id) => labels.get(id)?.full ?? id);
  if (parts.length === 0) return joinCapped(head || 'No changes', []);
  return joinCapped(head, parts);
}
