// Water as the solvent: Abraham gas→water coefficients (log10 K, K = c_aq/c_gas in mol/L) and Mintz
// ΔH_solv coefficients (kJ/mol), both as fitted by Chung et al. (2022) and carried in solvents.json.
// ΔG*_solv = −RT ln K is the Ben-Naim transfer (ideal gas at 1 mol/L → ideal solution at 1 mol/L).
import { R_GAS, T_REF } from '../../constants';
import { readDataJson } from '../../data/data-files';
import type { SoluteDescriptors } from './solute-database';

interface Coefficients {
  c: number;
  e: number;
  s: number;
  a: number;
  b: number;
  l: number;
}

interface SolventsJson {
  entries: { label: string; is_water?: boolean; abraham_dG: Coefficients; mintz_dH: Coefficients | null; dataCount?: { dGsolvMAE?: { value: number; units: string }; dHsolvMAE?: { value: number; units: string } } }[];
}

export interface WaterModel {
  dG: Coefficients;
  dH: Coefficients;
  /** published fit MAE of the water correlations, kJ/mol */
  dG_MAE_kJ: number;
  dH_MAE_kJ: number;
}

let cache: WaterModel | undefined;

export function waterModel(): WaterModel {
  if (!cache) {
    const water = readDataJson<SolventsJson>('source/estimation/rmg-groups/solvation/solvents.json').entries.find((e) => e.is_water);
    if (!water?.mintz_dH) throw new Error('solvents.json: water entry with Abraham and Mintz coefficients not found');
    const kcal = (x: { value: number; units: string } | undefined): number => (x && x.units === 'kcal/mol' ? x.value * 4.184 : Number.NaN);
    cache = { dG: water.abraham_dG, dH: water.mintz_dH, dG_MAE_kJ: kcal(water.dataCount?.dGsolvMAE), dH_MAE_kJ: kcal(water.dataCount?.dHsolvMAE) };
  }
  return cache;
}

const linear = (k: Coefficients, d: SoluteDescriptors): number => k.c + k.e * d.E + k.s * d.S + k.a * d.A + k.b * d.B + k.l * d.L;

/** log10 K (gas → water, both 1 mol/L) at 298.15 K. */
export function log10Kwater(d: SoluteDescriptors): number {
  return linear(waterModel().dG, d);
}

/** ΔG*_solv (1 mol/L gas → 1 mol/L solution) at 298.15 K, kJ/mol. */
export function dGsolvBenNaim(d: SoluteDescriptors): number {
  return (-R_GAS * T_REF * Math.LN10 * log10Kwater(d)) / 1000;
}

/** ΔH_solv by the Mintz correlation at 298.15 K, kJ/mol (no standard-state term: ideal enthalpies do not depend on p or c). */
export function dHsolvWater(d: SoluteDescriptors): number {
  return linear(waterModel().dH, d);
}

/** RT ln(c°RT/p°): the free energy of taking an ideal gas from 1 bar to 1 mol/L, +7.96 kJ/mol at 298.15 K. */
export function gasStandardStateShift(T = T_REF): number {
  const litreBarPerMolK = R_GAS / 100; // 0.0831446 L·bar/(mol K): 1 J = 0.01 L·bar
  return (R_GAS * T * Math.log((1 * litreBarPerMolK * T) / 1)) / 1000;
}
