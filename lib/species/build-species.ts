// Turns one team species as entered (form or CSV row) into stored values, with every problem named by field.
// Pure: no database. Ranges are our own sanity bounds (common practice), not physical limits.
import { isThermoError } from '../thermo/errors';
import { parseSpecies } from '../thermo/notation';
import { AQUEOUS_RANGE_K, NO_CP_RANGE_K } from '../thermo/species-state';
import type { SpeciesProvenanceInput, TeamSpeciesValues } from '../schemas/species';
import { checkConsistency, CONSISTENCY_TOLERANCE_KJ, type ConsistencyResult } from './consistency';
import { toJPerMolK, toKJPerMol } from './units';

export const LIMITS = {
  energy_kJ: 20000,
  entropyMin_J_per_K: { aq: -1000, other: 0 },
  entropyMax_J_per_K: 5000,
  cpMax_J_per_K: 5000,
  T_min_K: 10,
  T_max_K: 6000,
  sigmaEnergy_kJ: 1000,
  sigmaEntropy_J_per_K: 1000,
} as const;

export interface BuiltSpecies {
  key: string;
  formula: string;
  phase: 'g' | 'l' | 's' | 'aq';
  form: string | null;
  name: string;
  aliases: string[];
  elements: Record<string, number>;
  charge: number;
  dfH_kJ: number;
  dfG_kJ: number;
  dfGDerived: boolean;
  S_J_per_K: number;
  Cp_J_per_K: number | null;
  cpTmin_K: number | null;
  cpTmax_K: number | null;
  sigmaDfH_kJ: number | null;
  sigmaDfG_kJ: number | null;
  sigmaS_J_per_K: number | null;
  provenance: SpeciesProvenanceInput;
  notes: string;
}

export type BuildResult =
  | { ok: true; species: BuiltSpecies; consistency: ConsistencyResult; warnings: string[] }
  | { ok: false; errors: Record<string, string>; warnings: string[] };

const fmt = (x: number) => (Math.abs(x) >= 100 ? x.toFixed(1) : x.toFixed(2));

function readKey(v: TeamSpeciesValues, errors: Record<string, string>) {
  if (v.form !== null && v.phase !== 's') errors.form = 'Only a solid can have a named form.';
  try {
    const ref = parseSpecies(`${v.formula}(${v.form ?? v.phase})`);
    if (ref.alias !== null) throw new Error('name');
    return ref;
  } catch (err) {
    if (!isThermoError(err) && !(err instanceof Error && err.message === 'name')) throw err;
    errors.formula = `“${v.formula}” is not a formula we can read${isThermoError(err) ? `: ${err.message}` : ''}. Write it with element symbols, e.g. C7H6O3 or SO4-2.`;
    return null;
  }
}

function inRange(errors: Record<string, string>, field: string, label: string, x: number | null, lo: number, hi: number, unit: string) {
  if (x !== null && (x < lo || x > hi)) errors[field] = `${label} ${fmt(x)} ${unit} is outside ${lo} to ${hi} ${unit}.`;
}

export function buildSpecies(v: TeamSpeciesValues): BuildResult {
  const errors: Record<string, string> = {};
  const warnings: string[] = [];
  const ref = readKey(v, errors);
  const dfH_kJ = toKJPerMol(v.dfH, v.energyUnit);
  const givenDfG = v.dfG === null ? null : toKJPerMol(v.dfG, v.energyUnit);
  const S = toJPerMolK(v.S, v.entropyUnit);
  const Cp = v.Cp === null ? null : toJPerMolK(v.Cp, v.entropyUnit);
  const sigmaDfH = v.sigmaDfH === null ? null : toKJPerMol(v.sigmaDfH, v.energyUnit);
  const sigmaDfG = v.sigmaDfG === null ? null : toKJPerMol(v.sigmaDfG, v.energyUnit);
  const sigmaS = v.sigmaS === null ? null : toJPerMolK(v.sigmaS, v.entropyUnit);

  const E = LIMITS.energy_kJ;
  inRange(errors, 'dfH', 'ΔfH°', dfH_kJ, -E, E, 'kJ/mol');
  inRange(errors, 'dfG', 'ΔfG°', givenDfG, -E, E, 'kJ/mol');
  const sMin = v.phase === 'aq' ? LIMITS.entropyMin_J_per_K.aq : LIMITS.entropyMin_J_per_K.other;
  if (v.phase !== 'aq' && S <= 0) errors.S = `S° must be above 0 J/(mol K) for a ${v.phase === 'g' ? 'gas' : v.phase === 'l' ? 'liquid' : 'solid'} (third law).`;
  else inRange(errors, 'S', 'S°', S, sMin, LIMITS.entropyMax_J_per_K, 'J/(mol K)');
  if (Cp !== null && Cp <= 0) errors.Cp = 'Cp° must be above 0 J/(mol K).';
  else inRange(errors, 'Cp', 'Cp°', Cp, 0, LIMITS.cpMax_J_per_K, 'J/(mol K)');
  inRange(errors, 'sigmaDfH', 'σ(ΔfH°)', sigmaDfH, 0, LIMITS.sigmaEnergy_kJ, 'kJ/mol');
  inRange(errors, 'sigmaDfG', 'σ(ΔfG°)', sigmaDfG, 0, LIMITS.sigmaEnergy_kJ, 'kJ/mol');
  inRange(errors, 'sigmaS', 'σ(S°)', sigmaS, 0, LIMITS.sigmaEntropy_J_per_K, 'J/(mol K)');

  let cpTmin = v.cpTmin_K;
  let cpTmax = v.cpTmax_K;
  if (Cp === null && (cpTmin !== null || cpTmax !== null)) errors.Cp = 'Give Cp° for the temperature range, or leave the range blank.';
  if (Cp !== null) {
    // Our convention when no range is given: the same as for library species without a polynomial.
    const [lo, hi] = v.phase === 'aq' ? AQUEOUS_RANGE_K : NO_CP_RANGE_K;
    cpTmin ??= lo;
    cpTmax ??= hi;
    inRange(errors, 'cpTmin_K', 'The lowest temperature', cpTmin, LIMITS.T_min_K, LIMITS.T_max_K, 'K');
    inRange(errors, 'cpTmax_K', 'The highest temperature', cpTmax, LIMITS.T_min_K, LIMITS.T_max_K, 'K');
    if (cpTmin >= cpTmax) errors.cpTmax_K = 'The highest temperature must be above the lowest.';
    else if (cpTmin > 298.15 || cpTmax < 298.15) errors.cpTmin_K = 'The range must include 298.15 K, where the values are given.';
  }

  if (!ref || Object.keys(errors).length) return { ok: false, errors, warnings };

  const consistency = checkConsistency({ elements: ref.elements, charge: ref.charge, dfH_kJ, S_J_per_K: S, dfG_kJ: givenDfG });
  let dfG_kJ = givenDfG;
  if (consistency.status === 'inconsistent') {
    errors.dfG = `ΔfG° ${fmt(givenDfG!)} kJ/mol differs from ΔfH° − T·ΔfS° = ${fmt(consistency.expected_kJ)} kJ/mol by ${fmt(consistency.difference_kJ)} kJ/mol, more than ${CONSISTENCY_TOLERANCE_KJ}. Check ΔfH°, ΔfG° and S°, or leave ΔfG° blank to derive it.`;
  } else if (consistency.status === 'unchecked') {
    if (givenDfG === null) errors.dfG = `Give ΔfG°: the library has no reference-state S° for ${consistency.missing.join(', ')}, so it cannot be derived.`;
    else warnings.push(`ΔfG° not checked against ΔfH° and S°: no reference-state S° for ${consistency.missing.join(', ')}.`);
  } else if (consistency.status === 'derived') {
    dfG_kJ = consistency.expected_kJ;
  }
  if (Object.keys(errors).length) return { ok: false, errors, warnings };

  const aliases = [...new Set([v.name, ...v.aliases].map((a) => a.trim()).filter(Boolean))];
  return {
    ok: true,
    consistency,
    warnings,
    species: {
      key: ref.key, formula: ref.formula, phase: ref.phase, form: ref.form, name: v.name, aliases, elements: ref.elements, charge: ref.charge,
      dfH_kJ, dfG_kJ: dfG_kJ!, dfGDerived: givenDfG === null, S_J_per_K: S, Cp_J_per_K: Cp, cpTmin_K: Cp === null ? null : cpTmin, cpTmax_K: Cp === null ? null : cpTmax,
      sigmaDfH_kJ: sigmaDfH, sigmaDfG_kJ: sigmaDfG, sigmaS_J_per_K: sigmaS, provenance: v.provenance, notes: v.notes,
    },
  };
}

/** One line saying where a team value comes from, as the engine names it in provenance and warnings. */
export function provenanceLabel(p: SpeciesProvenanceInput): string {
  if (p.kind === 'citation') return p.citation;
  if (p.kind === 'measured') return `Measured: ${p.reference}`;
  return `Estimated (${p.method})`;
}
