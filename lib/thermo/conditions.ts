// Activities and the reaction quotient Q from the request's pressures and concentrations.
// Gases a = φ·p/p°; solutes a = γ·c/(1 mol/L); pure solids, pure liquids and the solvent a = 1.
import { ThermoError } from './errors';
import type { ReactionSpecies } from './reaction-thermo';
import type { SpeciesMatcher } from './species-matcher';
import { parseConcentration, parsePressure } from './units';
import type { EngineWarning } from './warnings';

export interface ConditionMaps {
  pressures?: Record<string, string> | undefined;
  concentrations?: Record<string, string> | undefined;
  fugacityCoefficients?: Record<string, number> | undefined;
  activityCoefficients?: Record<string, number> | undefined;
}

export interface QuotientResult {
  /** null unless at least one pressure or concentration was given */
  lnQ: number | null;
  /** activity used for each species key (1 for pure phases and defaulted species) */
  activities: Record<string, number>;
  /** gas and solute keys that took activity 1 for want of a condition */
  defaulted: string[];
  /** partial pressures given, bar, by key */
  partialPressures_bar: Map<string, number>;
  warnings: EngineWarning[];
}

const PHASE_WORD: Record<string, string> = { s: 'a solid', l: 'a liquid', g: 'a gas', aq: 'a solute' };

function resolveEntries(
  map: Record<string, unknown> | undefined,
  field: string,
  match: SpeciesMatcher,
): Map<ReactionSpecies, { mapKey: string; value: unknown }> {
  const out = new Map<ReactionSpecies, { mapKey: string; value: unknown }>();
  for (const [mapKey, value] of Object.entries(map ?? {})) {
    const s = match(mapKey);
    const f = `${field}.${mapKey}`;
    if (!s) throw new ThermoError('INVALID_VALUE', `${f}: "${mapKey}" is not a species of the equation`, { field: f });
    if (out.has(s)) {
      throw new ThermoError('INVALID_VALUE', `${f}: ${s.key} is given twice in ${field}`, { field: f });
    }
    out.set(s, { mapKey, value });
  }
  return out;
}

function requirePhase(s: ReactionSpecies, want: 'g' | 'aq', f: string, what: string): void {
  if (s.record.phase === want) return;
  const pure = s.record.phase === 's' || s.record.phase === 'l';
  throw new ThermoError('INVALID_VALUE', `${f}: ${s.key} is ${PHASE_WORD[s.record.phase]}; ${what} applies only to ${want === 'g' ? 'gases' : 'aqueous solutes'}`, {
    field: f,
    hint: pure ? 'pure solids and liquids (and the solvent water) have activity 1; leave them out' : `give ${s.key} in ${s.record.phase === 'g' ? 'pressures' : 'concentrations'} instead`,
  });
}

function amountValue(text: unknown, f: string, parse: (t: string, field: string) => number, s: ReactionSpecies): number {
  const v = parse(text as string, f);
  if (v < 0) throw new ThermoError('INVALID_VALUE', `${f}: ${s.key} cannot be negative (${String(text)})`, { field: f });
  if (v === 0 && s.nu !== 0) {
    throw new ThermoError('ZERO_ACTIVITY', `${f}: ${s.key} at zero activity makes ln Q infinite`, {
      field: f,
      hint: 'use a small positive value, or compute the equilibrium composition with "initial"',
    });
  }
  return v;
}

function coefficient(value: unknown, f: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new ThermoError('INVALID_VALUE', `${f}: a coefficient must be a positive finite number`, { field: f });
  }
  return value;
}

export function reactionQuotient(
  species: readonly ReactionSpecies[],
  maps: ConditionMaps,
  match: SpeciesMatcher,
  standardPressure_bar: number,
  /** φ and γ also serve the equilibrium, so they may come without a pressure/concentration */
  coefficientsWithoutConditions = false,
): QuotientResult {
  const pressures = resolveEntries(maps.pressures, 'pressures', match);
  const concentrations = resolveEntries(maps.concentrations, 'concentrations', match);
  const phis = resolveEntries(maps.fugacityCoefficients, 'fugacityCoefficients', match);
  const gammas = resolveEntries(maps.activityCoefficients, 'activityCoefficients', match);

  const activities: Record<string, number> = {};
  const partialPressures_bar = new Map<string, number>();
  const defaulted: string[] = [];
  let lnQ = 0;
  for (const s of species) {
    const p = pressures.get(s);
    const c = concentrations.get(s);
    const phi = phis.get(s);
    const gamma = gammas.get(s);
    let a = 1;
    if (p) {
      const f = `pressures.${p.mapKey}`;
      requirePhase(s, 'g', f, 'a pressure');
      const bar = amountValue(p.value, f, parsePressure, s);
      partialPressures_bar.set(s.key, bar);
      a = (bar / standardPressure_bar) * (phi ? coefficient(phi.value, `fugacityCoefficients.${phi.mapKey}`) : 1);
    } else if (c) {
      const f = `concentrations.${c.mapKey}`;
      requirePhase(s, 'aq', f, 'a concentration');
      a = amountValue(c.value, f, parseConcentration, s) * (gamma ? coefficient(gamma.value, `activityCoefficients.${gamma.mapKey}`) : 1);
    } else if (s.record.phase === 'g' || s.record.phase === 'aq') {
      defaulted.push(s.key);
    }
    if (phi) {
      const f = `fugacityCoefficients.${phi.mapKey}`;
      requirePhase(s, 'g', f, 'a fugacity coefficient');
      if (!p && !coefficientsWithoutConditions) throw new ThermoError('INVALID_VALUE', `${f}: ${s.key} has a fugacity coefficient but no pressure`, { field: f });
    }
    if (gamma) {
      const f = `activityCoefficients.${gamma.mapKey}`;
      requirePhase(s, 'aq', f, 'an activity coefficient');
      if (!c && !coefficientsWithoutConditions) throw new ThermoError('INVALID_VALUE', `${f}: ${s.key} has an activity coefficient but no concentration`, { field: f });
    }
    activities[s.key] = a;
    if (s.nu !== 0) lnQ += s.nu * Math.log(a);
  }

  const given = pressures.size + concentrations.size > 0;
  const warnings: EngineWarning[] = [];
  if (given && defaulted.length > 0) {
    warnings.push({
      code: 'DEFAULT_ACTIVITY',
      message: `No pressure or concentration given for ${defaulted.join(', ')}; activity 1 (standard state) assumed`,
      species: defaulted,
    });
  }
  return { lnQ: given ? lnQ : null, activities, defaulted: given ? defaulted : [], partialPressures_bar, warnings };
}
