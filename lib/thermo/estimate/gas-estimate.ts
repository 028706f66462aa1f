// Public entry for the ideal-gas group-additivity estimate (RMG-database groups, MIT): ΔfH°(298),
// S°(298), ΔfG°(298), Cp(T) as a Wilhoit fit, a σ measured on published data, and the groups used.
import { R_GAS, T_REF } from '../constants';
import { ThermoError } from '../errors';
import type { Chem, ParsedStructure } from '../structure/chem';
import { elementEntropySum } from './gani/element-entropy';
import { cpLimits } from './rmg/cp-limits';
import { entrySource } from './rmg/entry-source';
import { bensonAlcoholEnthalpies } from './rmg/alcohol-enthalpy';
import { bensonAmineEntropies } from './rmg/amine-entropy';
import { groupAdditivity, type GroupSum } from './rmg/group-sum';
import { completedEntropies } from './rmg/entropy-completions';
import type { MolGraph } from './rmg/mol-graph';
import { addThermo, zeroThermo } from './rmg/thermo-values';
import { buildMolecule } from './rmg/rdkit-graph';
import { loadRmgDatabase, type RmgDatabase } from './rmg/rmg-database';
import { sigmaFor } from './rmg/sigma-model';
import { CP_TEMPERATURES_K } from './rmg/thermo-values';
import { PER_OCCURRENCE, type WeakKind, weakReasons, WIDEN_ONLY } from './rmg/weak-classes';
import { molecularSymmetry } from './symmetry';
import { fitWilhoit, type WilhoitCp, wilhoitStateAt } from './wilhoit';

export { loadRmgDatabase, wilhoitStateAt };
export type { RmgDatabase, WeakKind, WilhoitCp };

export interface EstimateGroup {
  /** group file: group, ring, polycyclic, other, longDistanceInteraction_noncyclic/_cyclic */
  file: string;
  label: string;
  /** times used; negative for terms subtracted by the ring heuristics */
  count: number;
  /** per use */
  dH_kJ: number;
  dS_J_per_K: number;
  source: string;
}

export interface GasEstimate {
  method: 'group-additivity (RMG tree)';
  dfH_kJ: number;
  S_J_per_K: number;
  dfG_kJ: number;
  intrinsicS_J_per_K: number;
  symmetryNumber: number;
  opticalIsomers: number;
  cpPoints: { T_K: number; Cp_J_per_K: number }[];
  wilhoit: WilhoitCp;
  cpRange_K: [number, number];
  sigma_dfH_kJ: number;
  sigma_S_J_per_K: number;
  sigma_dfG_kJ: number;
  confidence: 'normal' | 'low';
  weakReasons: string[];
  /** machine-readable kinds of the weak reasons (what the σ model widened for) */
  weakKinds: WeakKind[];
  groups: EstimateGroup[];
  stereoNote?: string;
}

const SUPPORTED = new Set(['C', 'H', 'O', 'N', 'S', 'F', 'Cl', 'Br', 'I']);

function unsupported(message: string, details?: Record<string, unknown>): ThermoError {
  return new ThermoError('UNSUPPORTED_STRUCTURE', message, {
    field: 'smiles',
    hint: 'The gas group method covers neutral closed-shell molecules of C, H, O, N, S and halogens.',
    ...(details ? { details } : {}),
  });
}

/** Hill formula and element counts of the graph (H explicit). */
function composition(atoms: readonly { element: string }[]): { formula: string; elements: Record<string, number> } {
  const elements: Record<string, number> = {};
  for (const a of atoms) elements[a.element] = (elements[a.element] ?? 0) + 1;
  const rest = Object.keys(elements)
    .filter((e) => e !== 'C' && e !== 'H')
    .sort();
  const order = elements.C ? ['C', ...(elements.H ? ['H'] : []), ...rest] : Object.keys(elements).sort();
  return { formula: order.map((e) => (elements[e] === 1 ? e : `${e}${elements[e]}`)).join(''), elements };
}

/** Where the tree's mix of sources is off: Benson's alcohol ΔfH° (O–C pair) and aliphatic amine S° (N and α-C),
 *  and oxygen-ring S° terms completed from one parent compound each. */
function withBensonPairs(mol: MolGraph, sum: GroupSum): GroupSum {
  const contributions = completedEntropies(mol, bensonAmineEntropies(mol, bensonAlcoholEnthalpies(mol, sum.contributions)));
  const values = zeroThermo();
  for (const c of contributions) addThermo(values, c.values, c.sign);
  return { ...sum, contributions, values };
}

/** `structure`: a SMILES, or the resolver's parsed structure (its molecule is reused; no second RDKit parse, no InChI). */
export function estimateGas(chem: Chem, structure: string | ParsedStructure, db: RmgDatabase): GasEstimate {
  // From a SMILES, chem.parse is not called: its InChI step costs more than the whole estimate
  const built = buildMolecule(chem, structure, db.atomTypes);
  const smiles = typeof structure === 'string' ? structure : structure.smiles;
  const mol = built.graph;
  const { formula, elements } = composition(mol.atoms);
  const charge = mol.atoms.reduce((s, a) => s + a.charge, 0);
  const radicals = mol.atoms.reduce((s, a) => s + a.radicals, 0);
  if (charge !== 0) throw unsupported(`${formula} carries a net charge; ions are outside the gas group method.`);
  if (radicals > 0) throw unsupported(`${formula} is a radical (${radicals} unpaired electrons); only closed-shell molecules are estimated.`);
  const outside = mol.atoms.map((a, i) => ({ i, e: a.element })).filter(({ e }) => !SUPPORTED.has(e));
  if (outside.length > 0) {
    const atoms = outside.map(({ i, e }) => `atom ${i + 1} (${e})`);
    throw unsupported(`No group covers ${atoms.join(', ')}.`, { atoms });
  }
  const tree = groupAdditivity(db, mol);
  // Thermochemistry only (the solvation code sums other quantities on the same machinery).
  const sum = withBensonPairs(mol, tree);
  if (sum.unplaced.length > 0 || !sum.contributions.some((c) => c.file === 'group')) {
    const atoms = sum.unplaced.map((u) => `atom ${u.atom + 1} (${u.element}): ${u.reason}`);
    throw unsupported(atoms.length > 0 ? `No group can centre ${atoms.join('; ')}.` : `${formula} has no atom a group can centre.`, { atoms });
  }

  const sym = molecularSymmetry(mol, built.rdkitAromatic);
  const S = sum.values.S - R_GAS * Math.log(sym.symmetryNumber) + R_GAS * Math.log(sym.opticalIsomers);
  const dfH = sum.values.H;
  const reference = elementEntropySum(elements);
  if ('missing' in reference) throw unsupported(`No element entropy for ${reference.missing}.`);
  const dfG = dfH - (T_REF * (S - reference.sum)) / 1000;
  const { Cp0, CpInf } = cpLimits(mol);
  const wilhoit = fitWilhoit(CP_TEMPERATURES_K, sum.values.Cp, Cp0, CpInf, 1000);

  const reasons = weakReasons(db.trees, mol, sum.contributions, built.rdkitAromatic);
  const sigma = sigmaFor(reasons, built.heavyCount);
  const groups = new Map<string, EstimateGroup>();
  for (const c of sum.contributions) {
    const key = `${c.file}|${c.label}|${c.sign}`;
    const known = groups.get(key);
    if (known) known.count += c.sign;
    else groups.set(key, { file: c.file, label: c.label, count: c.sign, dH_kJ: c.values.H, dS_J_per_K: c.values.S, source: c.sourceOverride ?? entrySource(c.entry) });
  }
  return {
    method: 'group-additivity (RMG tree)',
    dfH_kJ: dfH,
    S_J_per_K: S,
    dfG_kJ: dfG,
    intrinsicS_J_per_K: sum.values.S,
    symmetryNumber: sym.symmetryNumber,
    opticalIsomers: sym.opticalIsomers,
    cpPoints: CP_TEMPERATURES_K.map((T, i) => ({ T_K: T, Cp_J_per_K: sum.values.Cp[i]! })),
    wilhoit,
    cpRange_K: [298, 1500],
    sigma_dfH_kJ: sigma.dH_kJ,
    sigma_S_J_per_K: sigma.S_J_per_K,
    sigma_dfG_kJ: sigma.dG_kJ,
    confidence: reasons.some((r) => !WIDEN_ONLY.has(r.kind)) ? 'low' : 'normal',
    weakReasons: reasons.map((r) => (r.count > 1 && PER_OCCURRENCE.has(r.kind) ? `${r.text} (${r.count} occurrences)` : r.text)),
    weakKinds: reasons.map((r) => r.kind),
    groups: [...groups.values()],
    ...(/[@/\\]/.test(smiles) || sym.opticalIsomers === 2 ? { stereoNote: 'Stereoisomers are treated alike: the groups do not see configuration; one configuration sets σ, and a chiral molecule is taken as the racemate (+R ln 2).' } : {}),
  };
}
