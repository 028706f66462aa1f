// A species record made from a structure by group contribution, for anything the library and the team lack.
// Gas: Benson-type group additivity on the RMG tree (fallback: the Gani 2022 method, with a σ that says how much
// worse it is outside its own regression set). Liquid: the gas estimate through Joback's ΔvapH and vapour
// pressure. Aqueous (neutral solutes only): the gas estimate plus Abraham hydration. Every record says so.
import { R_GAS, T_REF } from '../constants';
import { cpFromForm } from '../cp-forms';
import { ThermoError, isThermoError } from '../errors';
import { estimateGani } from '../estimate/gani';
import { estimateGas, loadRmgDatabase, type GasEstimate } from '../estimate/gas-estimate';
import { estimateJoback, jobackCp, watsonDvapH, type JobackEstimate } from '../estimate/joback';
import { aqueousFromGas, liquidFromGas, LIQUID_T_MIN_K, type GasValues, type MatchedGroup } from '../estimate/phase';
import { wilhoitCp } from '../estimate/wilhoit';
import type { CpModel, EstimateInfo, LibraryPhase, SpeciesRecord } from '../species-types';
import { AQUEOUS_RANGE_K } from '../species-state';
import type { Chem, ParsedStructure } from './chem';
import { organicKey } from './organic-format';

export const ESTIMATED_PHASES: readonly LibraryPhase[] = ['g', 'l', 'aq'];

interface GasResult {
  values: GasValues;
  cp: CpModel | null;
  /** Cp of the ideal gas at T, for the liquid's effective Cp */
  cpAt: ((T: number) => number) | null;
  cpRange: [number, number];
  info: EstimateInfo;
}

const groupsOf = (groups: readonly (MatchedGroup & { dfH_kJ?: number })[]) =>
  groups.map((g) => ({ label: g.label, count: g.count, source: g.source, ...(g.dfH_kJ !== undefined ? { dH_kJ: g.dfH_kJ } : {}) }));

function fromRmg(e: GasEstimate): GasResult {
  return {
    values: e,
    cp: { kind: 'form', source: 'Wilhoit fit to the group-additivity Cp (RMG tree), 298–1500 K', model: { form: 'Wilhoit', Tmin: e.cpRange_K[0], Tmax: e.cpRange_K[1], ...e.wilhoit } },
    cpAt: (T) => wilhoitCp(e.wilhoit, T),
    cpRange: e.cpRange_K,
    info: {
      method: 'Benson-type group additivity (RMG-database group tree)',
      groups: e.groups.map((g) => ({ label: `${g.file === 'group' ? '' : `${g.file}: `}${g.label}`, count: g.count, source: g.source, dH_kJ: g.dH_kJ, dS_J_per_K: g.dS_J_per_K })),
      confidence: e.confidence,
      notes: [
        `Symmetry number ${e.symmetryNumber}${e.opticalIsomers > 1 ? `, ${e.opticalIsomers} optical isomers` : ''} (S° = Σ groups − R ln σ + R ln n).`,
        ...e.weakReasons,
        ...(e.stereoNote ? [e.stereoNote] : []),
      ],
    },
  };
}

function fromGani(chem: Chem, smiles: string, why: string): GasResult {
  const g = estimateGani(chem, smiles);
  const joback = safeJoback(chem, smiles);
  const poly = joback ? jobackCp(joback.counts) : null;
  return {
    values: g,
    cp: poly ? { kind: 'form', source: 'Joback ideal-gas Cp polynomial (Joback & Reid 1987)', model: { form: 'Poling', Tmin: poly.range_K[0], Tmax: poly.range_K[1], coeffs: [poly.a / R_GAS, poly.b / R_GAS, poly.c / R_GAS, poly.d / R_GAS, 0] } } : null,
    cpAt: poly ? (T) => poly.cp(T) : null,
    cpRange: poly ? [poly.range_K[0], poly.range_K[1]] : [198.15, 398.15],
    info: {
      method: 'group contribution (Alshehri, Tula, You & Gani 2022), fallback',
      groups: groupsOf(g.groups),
      confidence: 'low',
      notes: [`The group tree could not place this structure (${why}); the Gani method is well off outside its own regression set, and σ says so.`, ...g.notes],
    },
  };
}

function safeJoback(chem: Chem, smiles: string): JobackEstimate | null {
  try {
    return estimateJoback(chem, smiles);
  } catch (err) {
    if (isThermoError(err)) return null;
    throw err;
  }
}

function gasEstimate(chem: Chem, structure: ParsedStructure): GasResult {
  const smiles = structure.smiles;
  try {
    // the resolver's parse is handed on: one RDKit parse per new structure
    return fromRmg(estimateGas(chem, structure, loadRmgDatabase()));
  } catch (err) {
    if (!isThermoError(err) || err.code !== 'UNSUPPORTED_STRUCTURE') throw err;
    // Charged, radical or outside C, H, O, N, S, halogens: no method applies, so no number.
    if (/charge|radical|No group covers/.test(err.message)) throw err;
    try {
      return fromGani(chem, smiles, err.message);
    } catch (fallback) {
      if (isThermoError(fallback)) throw err;
      throw fallback;
    }
  }
}

/** Effective Cp of the liquid, Cp(g) − dΔvapH/dT with Watson's ΔvapH(T), tabulated for the quadrature. */
function liquidCp(gas: GasResult, joback: JobackEstimate, upper: number): CpModel | null {
  if (!gas.cpAt || joback.Tc_K === null) return null;
  const Tc = joback.Tc_K;
  const dvap = (T: number) => watsonDvapH(joback.dvapH_Tb_kJ, joback.Tb_K, Tc, T) * 1000;
  const T: number[] = [];
  for (let t = LIQUID_T_MIN_K; t < upper; t += 10) T.push(t);
  T.push(upper);
  const Cp = T.map((t) => gas.cpAt!(t) - (dvap(t + 0.5) - dvap(t - 0.5)));
  return { kind: 'form', source: 'ideal-gas Cp minus dΔvapH/dT (Watson), common practice', model: { form: 'JANAF_table', Tmin: T[0]!, Tmax: upper, T, Cp } };
}

export interface EstimatedSpecies {
  record: SpeciesRecord;
  /** the gas estimate's own numbers, for the species answer's groups list */
  gas: GasValues;
}

/** Estimates `structure` in `phase`; throws UNSUPPORTED_STRUCTURE when no method applies, never a partial number. */
export function estimateSpecies(chem: Chem, structure: ParsedStructure, phase: LibraryPhase, name: string | null): EstimatedSpecies {
  if (!ESTIMATED_PHASES.includes(phase)) {
    throw new ThermoError('UNSUPPORTED_STRUCTURE', `No estimation method covers solids: ${name ?? structure.smiles}(s) needs measured or published values (enter them as a team species).`, {
      field: 'phase', hint: 'estimates exist for gas (g), liquid (l) and neutral aqueous solutes (aq)',
    });
  }
  if (structure.charge !== 0) {
    throw new ThermoError('UNSUPPORTED_STRUCTURE', `${structure.formula} is an ion: estimating it needs its pKa and the biochemical standard state, which Stepwell does not do yet. Give the neutral form, or enter measured values as a team species.`, { field: 'smiles' });
  }
  const gas = gasEstimate(chem, structure);
  let values: GasValues = gas.values;
  let cp = gas.cp;
  let range = gas.cpRange;
  const info: EstimateInfo = { ...gas.info, groups: [...gas.info.groups], notes: [...gas.info.notes] };
  if (phase === 'l') {
    const joback = estimateJoback(chem, structure.smiles);
    const liquid = liquidFromGas(gas.values, joback);
    values = liquid;
    const upper = Math.min(Math.max(joback.Tb_K, T_REF), joback.Tc_K ?? Infinity);
    cp = liquidCp(gas, joback, upper);
    range = [LIQUID_T_MIN_K, upper];
    info.method = `${gas.info.method}, then vaporisation (Joback Tb and ΔvapH, Watson, Clausius–Clapeyron)`;
    info.groups.push(...groupsOf(liquid.vaporisationGroups).map((g) => ({ ...g, label: `Joback: ${g.label}` })));
    info.notes.push(...liquid.notes, ...liquid.warnings);
  } else if (phase === 'aq') {
    const aq = aqueousFromGas(chem, structure, gas.values);
    values = aq;
    cp = null;
    range = [AQUEOUS_RANGE_K[0], AQUEOUS_RANGE_K[1]];
    info.method = `${gas.info.method}, then hydration (Abraham descriptors by groups, Chung et al. 2022)`;
    info.groups.push(...groupsOf(aq.groups).map((g) => ({ ...g, label: `solute: ${g.label}` })));
    info.notes.push(...aq.notes, 'ΔCp of solution is not estimated: ΔCp = 0 away from 298.15 K.');
  }
  const record: SpeciesRecord = {
    key: organicKey(structure.inchikey, phase),
    name: name ?? structure.smiles,
    aliases: name ? [name] : [],
    phase,
    form: null,
    formula: structure.formula,
    elements: structure.elements,
    charge: 0,
    dfH_kJ: values.dfH_kJ,
    dfG_kJ: values.dfG_kJ,
    S_J_per_K: values.S_J_per_K,
    Cp_J_per_K: cp?.kind === 'form' && range[0] <= T_REF && range[1] >= T_REF ? cpFromForm(cp.model, T_REF) : null,
    uncertainty: { dfH_kJ: values.sigma_dfH_kJ, dfG_kJ: values.sigma_dfG_kJ, S_J_per_K: values.sigma_S_J_per_K },
    uncertaintyRef: `estimate: ${info.method}`,
    compilationDifference: null,
    source: `Estimated: ${info.method}`,
    sourceRef: `${info.groups.length} group terms; confidence ${info.confidence}`,
    flags: ['estimated', 'dfGDerived'],
    cp: cp && cp.kind === 'form' ? { ...cp, model: { ...cp.model, Tmin: range[0], Tmax: range[1] } } : cp,
    otherStateRecords: [],
    structure: { smiles: structure.smiles, inchikey: structure.inchikey, cas: null },
    estimate: info,
  };
  return { record, gas: gas.values };
}
