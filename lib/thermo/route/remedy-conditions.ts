// Conditions remedy: ΔG = ΔG° + RT ln Q < goal needs ln Q below ln Q_max = (goal − ΔG°)/RT. Each
// gas or solute (pure solids and liquids have activity 1) gives one concrete change that gets there
// alone, re-evaluated before it is offered.
import type { EvaluateRequest } from '../../schemas/evaluate';
import { R_GAS } from '../constants';
import { evaluateStep, type EvaluateResponse } from '../evaluate';
import { isThermoError } from '../errors';
import type { SpeciesLookup } from '../species-library';
import { formatFold, formatScientific, formatSignificant, superscript } from '../../format/numbers';
import { num, round3 } from './route-format';
import type { ConditionsRemedy } from './route-types';
import { conditionMaps, stepActivities, withConditions, type SpeciesActivity } from './step-activities';

// Our own practical bounds for a screen: beyond these a change is not offered.
const MAX_REACTANT_PRESSURE_BAR = 1000;
const MAX_REACTANT_CONCENTRATION_M = 10;
const MIN_PRODUCT_PRESSURE_BAR = 1e-6;
const MIN_PRODUCT_CONCENTRATION_M = 1e-9;
// Aim 0.1 % past the bound, so that ΔG is strictly below the goal after rounding.
const MARGIN = 1.001;

interface Offer {
  action: 'product-pressure' | 'remove-product' | 'reactant-excess';
  s: SpeciesActivity;
  factor: number;
  activity: number;
  value: number;
  unit: 'bar' | 'mol/L';
}

function offerFor(s: SpeciesActivity, excess_ln: number, p0_bar: number): Offer | null {
  if (s.nu === 0 || (s.phase !== 'g' && s.phase !== 'aq')) return null;
  const needed = Math.exp(excess_ln / Math.abs(s.nu)) * MARGIN;
  const gas = s.phase === 'g';
  const unit = gas ? 'bar' : 'mol/L';
  // Activity ↔ pressure (a·p°/φ) or concentration (a/γ).
  const toValue = (a: number): number => (gas ? (a * p0_bar) / s.coefficient : a / s.coefficient);
  const toActivity = (v: number): number => (gas ? (v * s.coefficient) / p0_bar : v * s.coefficient);
  const now = toValue(s.activity);
  if (s.nu < 0) {
    const value = round3(now * needed, 'up');
    if (!(value <= (gas ? MAX_REACTANT_PRESSURE_BAR : MAX_REACTANT_CONCENTRATION_M))) return null;
    return { action: 'reactant-excess', s, factor: value / now, activity: toActivity(value), value, unit };
  }
  const value = round3(now / needed, 'down');
  if (!(value >= (gas ? MIN_PRODUCT_PRESSURE_BAR : MIN_PRODUCT_CONCENTRATION_M))) return null;
  return { action: gas ? 'product-pressure' : 'remove-product', s, factor: now / value, activity: toActivity(value), value, unit };
}

function sentence(o: Offer, goalText: string): string {
  const now = o.s.pressure ?? o.s.concentration ?? (o.unit === 'bar' ? 'the standard 1 bar' : 'the standard 1 mol/L');
  const rest = 'with the other species as given (or at standard state)';
  if (o.action === 'reactant-excess') {
    const what = o.unit === 'bar' ? `p(${o.s.key}) = ${formatSignificant(o.value, 3)} bar` : `c(${o.s.key}) = ${formatSignificant(o.value, 3)} mol/L`;
    return `Use a ${formatFold(o.factor)} excess of ${o.s.key} (${what} instead of ${now}), ${rest}: ΔG falls below ${goalText}`;
  }
  if (o.action === 'product-pressure') {
    return `Keep p(${o.s.key}) below ${formatSignificant(o.value, 3)} bar (remove it as it forms), ${rest}: ΔG falls below ${goalText}`;
  }
  return `Remove ${o.s.key} as it forms: keep its activity below ${formatSignificant(o.activity, 3)} (c below ${formatSignificant(o.value, 3)} mol/L), ${rest}: ΔG falls below ${goalText}`;
}

export function conditionsRemedies(request: EvaluateRequest, result: EvaluateResponse, goal_kJ: number, lookup: SpeciesLookup): ConditionsRemedy[] {
  const RT_kJ = (R_GAS * result.temperature_K) / 1000;
  const lnQ_current = result.lnQ ?? 0;
  const lnQ_max = (goal_kJ - result.deltaG0_kJ) / RT_kJ;
  const excess_ln = lnQ_current - lnQ_max;
  if (!(excess_ln > 0)) return [];
  const goalText = goal_kJ === 0 ? '0' : `${formatSignificant(goal_kJ, 4)} kJ/mol`;
  const species = stepActivities(request, result, lookup);
  const base = { kind: 'conditions' as const, goal_kJ, lnQ_current, lnQ_max };

  const out: ConditionsRemedy[] = [];
  for (const s of species) {
    const o = offerFor(s, excess_ln, result.standardPressure_bar);
    if (!o) continue;
    const text = `${num(o.value, 3)} ${o.unit}`;
    const maps = conditionMaps(species, o.unit === 'bar' ? { key: s.key, pressure: text } : { key: s.key, concentration: text });
    let checked: number | null = null;
    try {
      const r = evaluateStep(withConditions(request, maps, species), { lookup, checkFinite: false });
      checked = r.deltaG_kJ ?? r.deltaG0_kJ;
    } catch (err) {
      if (!isThermoError(err)) throw err;
    }
    // Offered only once the engine confirms it.
    if (checked === null || !(checked < goal_kJ)) continue;
    out.push({
      ...base,
      action: o.action,
      species: s.key,
      summary: sentence(o, goalText),
      activity_current: s.activity,
      activity_target: o.activity,
      factor: o.factor,
      value: o.value,
      unit: o.unit,
      conditions: maps,
      checkedDeltaG_kJ: checked,
    });
  }
  if (out.length === 0) {
    const fold = Math.exp(excess_ln);
    out.push({
      ...base,
      action: 'out-of-reach',
      species: null,
      // Read as a chemist writes it: "Q would have to fall 1.7 million-fold", never "10^6.24-fold".
      summary: `Q would have to fall ${Number.isFinite(fold) ? formatFold(fold) : `10${superscript(String(Math.round(excess_ln / Math.LN10)))}-fold`} (ln Q from ${formatSignificant(lnQ_current, 4)} to below ${formatSignificant(lnQ_max, 4)}); no single pressure or concentration change within practical bounds (≤ ${MAX_REACTANT_PRESSURE_BAR} bar, ≤ ${MAX_REACTANT_CONCENTRATION_M} mol/L, products ≥ ${formatScientific(MIN_PRODUCT_PRESSURE_BAR, 1)} bar or ${formatScientific(MIN_PRODUCT_CONCENTRATION_M, 1)} mol/L) gets there`,
      activity_current: null,
      activity_target: null,
      factor: Number.isFinite(fold) ? fold : null,
      value: null,
      unit: null,
      conditions: null,
      checkedDeltaG_kJ: null,
    });
  }
  return out;
}
