// One synthesis step, evaluated: ΔH°, ΔS°, ΔG°, K at T; ΔG and direction under conditions;
// crossover temperature, uncertainty, equilibrium composition, and every warning on the way.
import type { EvaluateRequest } from '../schemas/evaluate';
import { FARADAY, R_GAS, T_REF } from './constants';
import { reactionQuotient } from './conditions';
import { memoCrossover } from './crossover';
import { equilibriumFromRequest, type EquilibriumSummary } from './equilibrium-request';
import { ThermoError, isThermoError } from './errors';
import { kFromLnK } from './fit';
import { lookupParseOptions } from './lookup-parse-options';
import { parseSpecies } from './notation';
import { phaseWarnings } from './phase-checks';
import { applyOverride, type OverrideSummary } from './reaction-override';
import { STANDARD_PRESSURES_BAR, lnKFromDeltaG, reactionThermoAt, type ReactionSpecies } from './reaction-thermo';
import { resolveReaction } from './resolve-reaction';
import { assertFiniteNumbers } from './sanitise';
import type { SpeciesLookup, SpeciesOrigin } from './species-library';
import { makeSpeciesMatcher, type CanonicalKey } from './species-matcher';
import { isStructureLookup } from './structure/structure-lookup-type';
import { reactionUncertainty, speciesSigma, type UncertaintyResult } from './uncertainty';
import { parseTemperature } from './units';
import { fmt, type EngineWarning } from './warnings';

export type Direction = 'forward' | 'reverse' | 'at equilibrium';

export interface SpeciesProvenance {
  key: string;
  as_written: string;
  name: string;
  formula: string;
  nu: number;
  source: string;
  sourceRef: string;
  flags: string[];
  /** whose value was used: the built-in library's, the team's own, or a group-contribution estimate */
  origin: SpeciesOrigin;
  /** a team value used in place of a built-in one of the same key */
  override: boolean;
  /** canonical SMILES and InChIKey, for species known by structure */
  smiles: string | null;
  inchikey: string | null;
  /** the estimation method, for estimated species (then `source` says "Estimated: …" too) */
  method?: string;
  /** σ(ΔfG°) at 298.15 K used for the uncertainty, kJ/mol; null when none is known */
  sigma_dfG_kJ: number | null;
}

export interface EvaluateResponse {
  equation: string;
  /** the equation with species known by structure written by name ("ethyl acetate(l)") */
  equation_display: string;
  balanced: boolean;
  temperature_K: number;
  standardPressure_bar: number;
  heatCapacity: boolean;
  deltaH0_kJ: number;
  deltaS0_J_per_K: number;
  deltaG0_kJ: number;
  lnK: number;
  log10K: number;
  K: number | null;
  lnQ: number | null;
  deltaG_kJ: number | null;
  direction: Direction;
  crossover_K: number | null;
  maxWork_kJ: number;
  cellPotential_V: number | null;
  uncertainty: UncertaintyResult;
  equilibrium: EquilibriumSummary | null;
  species: SpeciesProvenance[];
  warnings: EngineWarning[];
  /** present when ΔH° and ΔS° came from `override` (a saved fit), not the library */
  override?: OverrideSummary;
}

// Hard limits: below 10 K or above 50 000 K no record of any species applies at all.
const T_FLOOR_K = 10;
const T_CEILING_K = 50000;
const GHS_TOLERANCE_KJ = 0.5;

function readTemperature(text: string | undefined): number {
  if (text === undefined) return T_REF;
  const T = parseTemperature(text, 'temperature');
  if (!(T > 0)) {
    throw new ThermoError('INVALID_VALUE', `temperature: ${text} is ${fmt(T)} K; it must be above 0 K`, { field: 'temperature' });
  }
  if (T < T_FLOOR_K || T > T_CEILING_K) {
    throw new ThermoError('OUT_OF_RANGE', `temperature: ${fmt(T)} K is outside ${T_FLOOR_K}–${T_CEILING_K} K, where no data exist`, {
      field: 'temperature',
    });
  }
  return T;
}

function readStandardPressure(text: string | undefined): number {
  if (text === undefined) return 1;
  const p = STANDARD_PRESSURES_BAR[text.trim() as keyof typeof STANDARD_PRESSURES_BAR];
  if (p === undefined) {
    throw new ThermoError('INVALID_VALUE', `standardPressure must be "1 bar" or "1 atm", not "${text}"`, { field: 'standardPressure' });
  }
  return p;
}

function direction(dG: number, scale: number): Direction {
  if (Math.abs(dG) < 1e-6 || Math.abs(dG) <= 1e-9 * scale) return 'at equilibrium';
  return dG < 0 ? 'forward' : 'reverse';
}

function dataWarnings(species: readonly ReactionSpecies[], lookup: SpeciesLookup, ghsMismatch_kJ: number): EngineWarning[] {
  const out: EngineWarning[] = [];
  for (const s of species) {
    const builtin = lookup.shadowed?.(s.key);
    if (builtin) {
      out.push({
        code: 'OVERRIDE',
        message: `${s.key}: team value used (ΔfG° ${fmt(s.record.dfG_kJ, 6)} kJ/mol, ${s.record.source}) instead of the built-in ${fmt(builtin.dfG_kJ, 6)} kJ/mol (${builtin.source})`,
        species: [s.key],
      });
    }
    if (s.record.flags.includes('fromMemory')) {
      out.push({ code: 'FROM_MEMORY', message: `${s.key}: ${s.record.source} — not yet checked against the printed source`, species: [s.key] });
    }
  }
  if (Math.abs(ghsMismatch_kJ) > GHS_TOLERANCE_KJ) {
    const relaxed = species.filter((s) => s.record.flags.includes('ghsRelaxed')).map((s) => s.key);
    out.push({
      code: 'GHS_INCONSISTENT',
      message: `Tabulated ΔfG° differs from ΔfH° − T·S° by ${fmt(ghsMismatch_kJ, 3)} kJ/mol for this reaction at 298.15 K${relaxed.length ? ` (NBS relaxed the G-H-S constraint for ${relaxed.join(', ')})` : ''}; ΔG° follows the tabulated ΔfG°, ΔS° the tabulated S°`,
      species: relaxed,
    });
  }
  return out;
}

function canonicalKeyFor(lookup: SpeciesLookup): CanonicalKey {
  return (text) => {
    try {
      return parseSpecies(text, lookupParseOptions(lookup)).key;
    } catch (err) {
      if (isThermoError(err)) return undefined;
      throw err;
    }
  };
}

function speciesProvenance(s: ReactionSpecies, lookup: SpeciesLookup): SpeciesProvenance {
  const r = s.record;
  return {
    key: s.key,
    as_written: s.asWritten,
    name: r.name,
    formula: r.formula,
    nu: s.nu,
    source: r.source,
    sourceRef: r.sourceRef,
    flags: [...r.flags],
    origin: r.estimate ? 'estimated' : (lookup.origin?.(s.key) ?? 'library'),
    override: lookup.shadowed?.(s.key) !== undefined,
    smiles: r.structure?.smiles ?? null,
    inchikey: r.structure?.inchikey ?? null,
    ...(r.estimate ? { method: r.estimate.method } : {}),
    sigma_dfG_kJ: speciesSigma(r).sigma_kJ,
  };
}

export interface EvaluateOptions {
  /** the library, team species and estimator to resolve species with; always given, never a default */
  lookup: SpeciesLookup;
  /** false leaves the finite-number check to a caller that checks its whole answer (route evaluation) */
  checkFinite?: boolean;
}

/** The lookup with the request's labels resolved; a lookup that does not know structures cannot take them. */
function lookupFor(request: EvaluateRequest, lookup: SpeciesLookup): SpeciesLookup {
  if (!request.species || Object.keys(request.species).length === 0) return lookup;
  if (!isStructureLookup(lookup)) {
    throw new ThermoError('INVALID_VALUE', 'species definitions need the chemistry toolkit, which this caller did not load', { field: 'species' });
  }
  return lookup.withLabels(request.species);
}

export function evaluateStep(request: EvaluateRequest, opts: EvaluateOptions): EvaluateResponse {
  const lookup = lookupFor(request, opts.lookup);
  const T = readTemperature(request.temperature);
  const standardPressure_bar = readStandardPressure(request.standardPressure);
  const heatCapacity = request.heatCapacity ?? true;
  const reaction = resolveReaction(request.equation, lookup);
  const species = reaction.species;
  const canonicalKey = canonicalKeyFor(lookup);
  const match = makeSpeciesMatcher(species, canonicalKey);

  const fitted = request.override ? applyOverride(request.override, species, T, { lookup, standardPressure_bar }) : null;
  const thermo = fitted?.thermo ?? reactionThermoAt(species, T, { heatCapacity, standardPressure_bar });
  const lnK = lnKFromDeltaG(thermo.deltaG0_kJ, T);
  const k = kFromLnK(lnK);

  const q = reactionQuotient(species, request, match, standardPressure_bar, request.initial !== undefined);
  const RT_kJ = (R_GAS * T) / 1000;
  const deltaG_kJ = q.lnQ === null ? null : thermo.deltaG0_kJ + RT_kJ * q.lnQ;
  const decisive = deltaG_kJ ?? thermo.deltaG0_kJ;
  const scale = Math.max(Math.abs(thermo.deltaG0_kJ), q.lnQ === null ? 0 : Math.abs(RT_kJ * q.lnQ));

  const eq = equilibriumFromRequest(request, { species, match, canonicalKey, lookup, lnK, standardPressure_bar });

  const warnings = [
    ...phaseWarnings(species, T, lookup, q.partialPressures_bar),
    ...dataWarnings(species, lookup, thermo.ghsMismatch_kJ),
    ...q.warnings,
    ...eq.warnings,
    ...(fitted ? [fitted.warning] : []),
  ];

  const response: EvaluateResponse = {
    equation: reaction.equation,
    equation_display: reaction.equationDisplay,
    balanced: true,
    temperature_K: T,
    standardPressure_bar,
    heatCapacity,
    deltaH0_kJ: thermo.deltaH0_kJ,
    deltaS0_J_per_K: thermo.deltaS0_J_per_K,
    deltaG0_kJ: thermo.deltaG0_kJ,
    lnK,
    log10K: k.log10K,
    K: k.K,
    lnQ: q.lnQ,
    deltaG_kJ,
    direction: direction(decisive, scale),
    crossover_K: fitted ? fitted.crossover_K : memoCrossover(species, { heatCapacity, standardPressure_bar }),
    maxWork_kJ: -decisive,
    cellPotential_V: request.electrons === undefined ? null : (-decisive * 1000) / (request.electrons * FARADAY),
    uncertainty: fitted ? fitted.uncertainty(decisive) : reactionUncertainty(species, decisive),
    equilibrium: eq.result,
    species: species.map((s) => speciesProvenance(s, lookup)),
    warnings,
    ...(fitted ? { override: fitted.summary } : {}),
  };
  return opts.checkFinite === false ? response : assertFiniteNumbers(response);
}
