// Maps the request's `initial`, `totalPressure` and `volume` onto the equilibrium solver.
// Amounts are in mol; a solute may instead be given as a concentration, n = c·V.
import type { EvaluateRequest } from '../schemas/evaluate';
import { ThermoError } from './errors';
import { solveEquilibrium } from './equilibrium';
import type { ReactionSpecies } from './reaction-thermo';
import type { SpeciesLookup } from './species-library';
import type { CanonicalKey, SpeciesMatcher } from './species-matcher';
import { parseAmount, parseConcentration, parsePressure, parseVolume, quantityKindOf } from './units';
import type { EngineWarning } from './warnings';

export interface EquilibriumSummary {
  extent_mol: number;
  /** by species as written (inert species by their map key) */
  amounts_mol: Record<string, number>;
  conversion: number;
  limiting: string[];
  runsInReverse: boolean;
  totalPressure_bar: number;
  volume_L: number;
}

interface Context {
  species: readonly ReactionSpecies[];
  match: SpeciesMatcher;
  canonicalKey: CanonicalKey;
  lookup: SpeciesLookup;
  lnK: number;
  standardPressure_bar: number;
}

function positive(value: number, field: string): number {
  if (!(value > 0)) throw new ThermoError('INVALID_VALUE', `${field} must be greater than zero`, { field });
  return value;
}

function readAmount(text: string, field: string, isSolute: boolean, volume_L: number, key: string): number {
  const kind = quantityKindOf(text);
  let n: number;
  if (kind === 'concentration') {
    if (!isSolute) {
      throw new ThermoError('INVALID_UNIT', `${field}: a concentration applies only to aqueous solutes, not ${key}`, {
        field,
        hint: 'give the amount in mol',
      });
    }
    n = parseConcentration(text, field) * volume_L;
  } else {
    n = parseAmount(text, field);
  }
  if (n < 0) throw new ThermoError('INVALID_VALUE', `${field}: an amount cannot be negative`, { field });
  return n;
}

function coefficientMap(map: Record<string, number> | undefined, match: SpeciesMatcher): Map<string, number> {
  const out = new Map<string, number>();
  for (const [k, v] of Object.entries(map ?? {})) {
    const s = match(k);
    if (s) out.set(s.key, v);
  }
  return out;
}

function solve(input: Parameters<typeof solveEquilibrium>[0]): ReturnType<typeof solveEquilibrium> {
  try {
    return solveEquilibrium(input);
  } catch (err) {
    if (err instanceof RangeError) throw new ThermoError('INVALID_VALUE', `initial: ${err.message}`, { field: 'initial' });
    throw err;
  }
}

export function equilibriumFromRequest(
  req: EvaluateRequest,
  ctx: Context,
): { result: EquilibriumSummary | null; warnings: EngineWarning[] } {
  if (!req.initial || Object.keys(req.initial).length === 0) return { result: null, warnings: [] };
  const warnings: EngineWarning[] = [];
  const totalPressure_bar = positive(
    req.totalPressure === undefined ? ctx.standardPressure_bar : parsePressure(req.totalPressure, 'totalPressure'),
    'totalPressure',
  );
  const volume_L = positive(req.volume === undefined ? 1 : parseVolume(req.volume, 'volume'), 'volume');

  const initial_mol = new Map<string, number>();
  const inerts: Record<string, number> = {};
  let inertGas_mol = 0;
  for (const [mapKey, text] of Object.entries(req.initial)) {
    const field = `initial.${mapKey}`;
    const s = ctx.match(mapKey);
    if (s) {
      initial_mol.set(s.key, readAmount(text, field, s.record.phase === 'aq', volume_L, s.key));
      continue;
    }
    const key = ctx.canonicalKey(mapKey);
    const inert = key === undefined ? undefined : ctx.lookup.get(key);
    if (!inert) {
      throw new ThermoError('INVALID_VALUE', `${field}: "${mapKey}" is neither in the equation nor a library species`, { field });
    }
    const n = readAmount(text, field, inert.phase === 'aq', volume_L, inert.key);
    inerts[mapKey] = n;
    if (inert.phase === 'g') inertGas_mol += n;
  }
  if (Object.keys(inerts).length > 0) {
    warnings.push({
      code: 'INERT_SPECIES',
      message: `Not in the equation, treated as inert: ${Object.keys(inerts).join(', ')} (only inert gases change the result, by diluting the gas phase)`,
      species: Object.keys(inerts),
    });
  }

  const aqueous = ctx.species.some((s) => s.record.phase === 'aq');
  const unlimited = new Set<string>();
  const water = ctx.species.find((s) => s.key === 'H2O(l)');
  if (aqueous && water && !initial_mol.has(water.key)) {
    unlimited.add(water.key);
    warnings.push({
      code: 'SOLVENT_IN_EXCESS',
      message: 'H2O(l) is the solvent: taken as present in excess and left out of the amounts',
      species: [water.key],
    });
  }

  const solved = solve({
    species: ctx.species,
    initial_mol,
    unlimited,
    inertGas_mol,
    lnK: ctx.lnK,
    totalPressure_bar,
    standardPressure_bar: ctx.standardPressure_bar,
    volume_L,
    fugacityCoefficients: coefficientMap(req.fugacityCoefficients, ctx.match),
    activityCoefficients: coefficientMap(req.activityCoefficients, ctx.match),
  });
  if (solved.atLimit) {
    warnings.push({
      code: 'EQUILIBRIUM_LIMIT',
      message: solved.limiting.length
        ? `No equilibrium with every species present: the reaction stops when ${solved.limiting.join(', ')} is used up`
        : 'No reaction is possible from the given amounts',
      species: solved.limiting,
    });
  }
  const amounts_mol: Record<string, number> = {};
  for (const s of ctx.species) {
    const n = solved.amounts_mol[s.key];
    if (n !== undefined) amounts_mol[s.asWritten] = n;
  }
  Object.assign(amounts_mol, inerts);
  return {
    result: {
      extent_mol: solved.extent_mol,
      amounts_mol,
      conversion: solved.conversion,
      limiting: solved.limiting,
      runsInReverse: solved.runsInReverse,
      totalPressure_bar,
      volume_L,
    },
    warnings,
  };
}
