// Warnings about the data behind a result at temperature T: outside a species' data range,
// past a phase change, or extrapolated with a constant (or missing) heat capacity.
import { R_GAS, T_REF } from './constants';
import { commonRange, findCrossover } from './crossover';
import { reactionThermoAt, type ReactionSpecies } from './reaction-thermo';
import type { SpeciesLookup } from './species-library';
import { speciesRange } from './species-state';
import type { SpeciesRecord } from './species-types';
import { fmt, type EngineWarning } from './warnings';

const AGGREGATES = ['g', 'l', 's'] as const;
const STATE_WORD: Record<string, string> = { g: 'gas', l: 'liquid', s: 'solid' };

function baseOf(key: string): string {
  return key.replace(/\([^()]*\)$/, '');
}

function pairOf(from: SpeciesRecord, to: SpeciesRecord): ReactionSpecies[] {
  return [
    { key: from.key, asWritten: from.key, nu: -1, record: from },
    { key: to.key, asWritten: to.key, nu: 1, record: to },
  ];
}

interface PairInfo {
  pair: ReactionSpecies[];
  range: [number, number] | null;
  /** transition temperature at 1 bar from the library itself; undefined until first asked */
  tTrans?: number | null;
}

// Per record pair: the two-species "reaction", its common range and transition temperature.
const pairCache = new WeakMap<SpeciesRecord, Map<SpeciesRecord, PairInfo>>();

function pairInfo(from: SpeciesRecord, to: SpeciesRecord): PairInfo {
  let inner = pairCache.get(from);
  if (!inner) {
    inner = new Map();
    pairCache.set(from, inner);
  }
  let info = inner.get(to);
  if (!info) {
    const pair = pairOf(from, to);
    info = { pair, range: commonRange(pair) };
    inner.set(to, info);
  }
  return info;
}

function transitionT(info: PairInfo): number | null {
  if (info.tTrans === undefined) info.tTrans = findCrossover(info.pair);
  return info.tTrans;
}

// Counterparts per lookup object, as a team lookup may add or shadow states.
const counterpartCache = new WeakMap<SpeciesLookup, WeakMap<SpeciesRecord, SpeciesRecord[]>>();

/** Other aggregate states of the same substance in the lookup (H2O(l) ↔ H2O(g)); named polymorphs excluded. */
function counterparts(record: SpeciesRecord, lookup: SpeciesLookup): readonly SpeciesRecord[] {
  if (record.form !== null || record.phase === 'aq') return [];
  let byRecord = counterpartCache.get(lookup);
  if (!byRecord) {
    byRecord = new WeakMap();
    counterpartCache.set(lookup, byRecord);
  }
  const hit = byRecord.get(record);
  if (hit) return hit;
  const base = baseOf(record.key);
  const out: SpeciesRecord[] = [];
  for (const p of AGGREGATES) {
    if (p === record.phase) continue;
    const other = lookup.get(`${base}(${p})`);
    if (other && other.form === null) out.push(other);
  }
  byRecord.set(record, out);
  return out;
}

// Record names in the source mark the state: "(L)" liquid, anything else condensed is a solid form.
const isLiquidRecord = (name: string): boolean => /\(L\)$/.test(name);

function rangeWarnings(s: ReactionSpecies, T: number, out: EngineWarning[]): void {
  const [lo, hi] = speciesRange(s.record);
  if (T < lo || T > hi) {
    const basis = s.record.cp?.kind === 'nasa9' ? 'polynomial data' : 'data range (our convention for species without a polynomial)';
    out.push({
      code: 'T_OUT_OF_RANGE',
      message: `${s.key}: ${fmt(T, 6)} K is outside its ${basis}, ${fmt(lo, 6)}–${fmt(hi, 6)} K; values are extrapolated`,
      species: [s.key],
    });
    // Melting above a solid's last record, freezing below a liquid's first one.
    const other = s.record.otherStateRecords;
    const next = s.record.phase === 's' && T > hi ? other.filter(isLiquidRecord)
      : s.record.phase === 'l' && T < lo ? other.filter((n) => !isLiquidRecord(n)) : [];
    if (next.length > 0) {
      const verb = s.record.phase === 's' ? 'melts' : 'freezes';
      out.push({
        code: 'PHASE_CHANGE',
        message: `${s.key}: ${verb} at about ${fmt(T > hi ? hi : lo, 6)} K, where its ${STATE_WORD[s.record.phase]} data end (the source has ${next.join(', ')} beyond)`,
        species: [s.key],
      });
    }
  }
  if (T !== T_REF && s.record.cp?.kind !== 'nasa9') {
    const how = s.record.cp?.kind === 'constant'
      ? `with constant Cp° = ${fmt(s.record.cp.value)} J/(mol K)`
      : 'with no heat-capacity data (its ΔCp contribution is taken as zero)';
    out.push({ code: 'CONSTANT_CP', message: `${s.key}: no Cp° polynomial; extrapolated from 298.15 K ${how}`, species: [s.key] });
  }
}

// Message parts, built only when a warning is returned; most calls return null.
function transitionNote(tTrans: number | null): string {
  return tTrans === null ? '' : ` (transition at 1 bar ≈ ${fmt(tTrans, 5)} K from library data)`;
}

function here(s: ReactionSpecies, T: number): string {
  return `${s.key}: at ${fmt(T, 6)} K`;
}

function stabilityWarning(
  s: ReactionSpecies,
  other: SpeciesRecord,
  T: number,
  partialPressure_bar: number | undefined,
): EngineWarning | null {
  const info = pairInfo(s.record, other);
  const { pair, range } = info;
  if (!range) return null;
  const [lo, hi] = range;
  const tTrans = transitionT(info);
  // Outside the pair's common range only the edge value is trusted, never an extrapolation.
  const inside = T >= lo && T <= hi;
  const edge = T < lo ? lo : hi;
  const dG = reactionThermoAt(pair, inside ? T : edge).deltaG0_kJ;
  if (s.record.phase === 'g') {
    if (!inside) {
      return T < lo && dG < 0
        ? { code: 'PHASE_CHANGE', message: `${here(s, T)} a condensed state is stable at 1 bar: already at ${fmt(lo, 6)} K, where the ${other.key} data start, ${other.key} is more stable${transitionNote(tTrans)}`, species: [s.key] }
        : null;
    }
    // The gas condenses only if its partial pressure exceeds the vapour pressure.
    const pVap = Math.exp((dG * 1000) / (R_GAS * T));
    const p = partialPressure_bar ?? 1;
    if (p <= pVap) return null;
    return {
      code: 'PHASE_CHANGE',
      message: `${here(s, T)} the ${STATE_WORD[other.phase]} ${other.key} is stable at ${fmt(p)} bar${transitionNote(tTrans)}; vapour pressure ≈ ${fmt(pVap, 3)} bar, so the gas is a hypothetical (supersaturated) state`,
      species: [s.key],
    };
  }
  if (dG >= 0 || (!inside && T < lo)) return null;
  const extra = inside && other.phase === 'g'
    ? `; it stays ${STATE_WORD[s.record.phase]} only above ≈ ${fmt(Math.exp((-dG * 1000) / (R_GAS * T)), 3)} bar`
    : '';
  return {
    code: 'PHASE_CHANGE',
    message: `${here(s, T)} and 1 bar the ${STATE_WORD[other.phase]} ${other.key} is the stable state${transitionNote(tTrans)}${extra}`,
    species: [s.key],
  };
}

export function phaseWarnings(
  species: readonly ReactionSpecies[],
  T: number,
  lookup: SpeciesLookup,
  partialPressures_bar: ReadonlyMap<string, number> = new Map(),
): EngineWarning[] {
  const out: EngineWarning[] = [];
  for (const s of species) {
    rangeWarnings(s, T, out);
    for (const other of counterparts(s.record, lookup)) {
      const w = stabilityWarning(s, other, T, partialPressures_bar.get(s.key));
      if (w) out.push(w);
    }
  }
  return out;
}
