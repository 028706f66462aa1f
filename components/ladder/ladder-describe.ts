// Words for the ladder: class names, the ΔG written on a riser, a riser's accessible name and the
// tooltip's facts. Pure, so the same wording reaches sighted and screen-reader users and tests.
import type { RouteStepResult, StepClass } from '@/lib/thermo/route';
import { formatEnergy, formatNumber, formatSigned, type EnergyUnit } from './energy-format';
import type { LadderStep } from './ladder-geometry';
import { CLASS_STYLES } from './ladder-palette';
import { ESTIMATE_GLYPH, ESTIMATE_WORD, estimateFacts, stepSignUncertainText } from './ladder-uncertainty';
import { textAsWritten } from './remedy-names';

export const CLASS_TEXT: Record<StepClass, string> = {
  downhill: 'Downhill',
  marginal: 'Marginal',
  uphill: 'Uphill',
  error: 'Not evaluated',
};

export function stepLabelOf(id: string, labels: Record<string, string> | undefined): string {
  const label = labels?.[id]?.trim();
  return label ? label : id;
}

/** ΔG per mol of reaction at the step's conditions (ΔG° when it gives none), as the engine classes it. */
export function perMolDeltaG(step: Pick<RouteStepResult, 'result'>): number | null {
  const r = step.result;
  return r ? (r.deltaG_kJ ?? r.deltaG0_kJ) : null;
}

/** What the riser says: its class glyph and the step's ΔG for the route, e.g. "↑ +12.3". */
export function riserText(step: LadderStep): string {
  const glyph = CLASS_STYLES[step.cls].glyph;
  if (step.gap === 'error') return `${glyph} ${step.problemLabel ?? 'not evaluated'}`;
  if (step.gap === 'not-counted') return 'not in totals';
  return `${glyph} ${formatSigned(step.to - step.from, 1)}`;
}

export function stepAriaLabel(step: LadderStep, label: string, unit: EnergyUnit, isSelected: boolean): string {
  const parts = [`Step ${step.slot}, ${label}`];
  if (step.gap === 'error') parts.push(`not evaluated, ${step.problemLabel ?? 'see the step'}`);
  else {
    parts.push(CLASS_TEXT[step.cls].toLowerCase());
    if (step.gap === 'not-counted') parts.push('no extent, not in the totals');
    else parts.push(`ΔG ${formatSigned(step.to - step.from, 1)} ${unit}, running total ${formatSigned(step.to, 1)} ${unit}`);
    if (step.signUncertain) parts.push(stepSignUncertainText(step.sigma_kJ, unit));
  }
  if (step.estimated) parts.push(`uses ${ESTIMATE_WORD} values`);
  if (isSelected) parts.push('selected');
  return parts.join('; ');
}

export interface Fact {
  term: string;
  value: string;
}

/** The tooltip's lines, each energy in the user's unit. */
export function stepFacts(step: RouteStepResult | undefined, unit: EnergyUnit): Fact[] {
  if (!step) return [{ term: 'Status', value: 'missing from the evaluation' }];
  const facts: Fact[] = [];
  const r = step.result;
  if (r) facts.push({ term: 'Equation', value: textAsWritten(r.equation, r) });
  if (!r) {
    facts.push({ term: 'Status', value: step.error?.message ?? 'could not be evaluated' });
    return facts;
  }
  const mol = perMolDeltaG(step);
  facts.push({ term: r.deltaG_kJ === null ? 'ΔG (standard state)' : 'ΔG at conditions', value: formatEnergy(mol, unit, { perMol: true }) });
  facts.push({ term: 'ΔG°', value: formatEnergy(r.deltaG0_kJ, unit, { perMol: true }) });
  facts.push({ term: 'Extent', value: step.extent_mol === null ? 'none (not in the totals)' : `${formatNumber(step.extent_mol)} mol` });
  if (step.deltaG_kJ !== null) facts.push({ term: 'ΔG for the route', value: formatEnergy(step.deltaG_kJ, unit) });
  facts.push({ term: 'Class', value: `${CLASS_STYLES[step.class].glyph} ${CLASS_TEXT[step.class]}${step.signUncertain ? ' (sign uncertain)' : ''}` });
  if (step.signUncertain) facts.push({ term: 'Sign', value: stepSignUncertainText(r.uncertainty.deltaG0_kJ, unit) });
  facts.push(...estimateFacts(r, unit));
  return facts;
}

/** "◌ estimated values in steps 1 Reduce, 3 Boc" for the exported notes; null when no step uses any. */
export function estimatedStepsNote(steps: readonly LadderStep[], labelOf: (id: string) => string): string | null {
  const marked = steps.filter((s) => s.estimated);
  if (marked.length === 0) return null;
  const which = marked.map((s) => `${s.slot} ${labelOf(s.id)}`).join(', ');
  return `${ESTIMATE_GLYPH} ${ESTIMATE_WORD} values (group contribution, not measured) in ${marked.length === 1 ? 'step' : 'steps'} ${which}`;
}

/** The SVG's <desc>: the whole ladder in a few sentences. `notes` are the estimate and total-σ notes, as shown. */
export function ladderSummary(steps: readonly LadderStep[], end: number, end0: number, unit: EnergyUnit, notes: readonly string[] = []): string {
  const count = (cls: StepClass): number => steps.filter((s) => s.cls === cls && s.gap !== 'error').length;
  const errors = steps.filter((s) => s.gap === 'error').length;
  const bits = [
    `${steps.length} ${steps.length === 1 ? 'step' : 'steps'}`,
    `${count('uphill')} uphill`,
    `${count('marginal')} marginal`,
    `${count('downhill')} downhill`,
    ...(errors ? [`${errors} not evaluated`] : []),
  ];
  const uncertain = steps.filter((s) => s.signUncertain).map((s) => `step ${s.slot} ${stepSignUncertainText(s.sigma_kJ, unit)}`);
  const tail = [...uncertain, ...notes].map((t) => ` ${t.charAt(0).toUpperCase()}${t.slice(1)}.`).join('');
  return `${bits.join(', ')}. Route total ΔG ${formatSigned(end, 1)} ${unit}, standard ΔG° ${formatSigned(end0, 1)} ${unit}.${tail}`;
}

/** Axis title, e.g. "Cumulative ΔG / kJ per mol of target". */
export function axisTitle(unit: EnergyUnit, basis: string): string {
  return `Cumulative ΔG / ${unit} ${basis}`.trim();
}
