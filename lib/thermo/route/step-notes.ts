// Step class from ΔG per mol of reaction, and the safety notes a thermodynamic screen owes its reader.
import type { EvaluateResponse } from '../evaluate';
import type { SpeciesLookup } from '../species-library';
import { num } from './route-format';
import type { StepClass, StepNote } from './route-types';

/** ΔH° below this is strongly exothermic (kJ per mol of reaction; common practice). */
export const HEAT_RELEASE_THRESHOLD_KJ = -100;

/** uphill ΔG > 0; marginal threshold < ΔG ≤ 0; downhill ΔG ≤ threshold. */
export function classify(deltaG_kJ: number, threshold_kJ: number): StepClass {
  if (deltaG_kJ > 0) return 'uphill';
  return deltaG_kJ > threshold_kJ ? 'marginal' : 'downhill';
}

export function gasMoleChange(result: EvaluateResponse, lookup: SpeciesLookup): number {
  return result.species.reduce((dn, s) => dn + (lookup.get(s.key)?.phase === 'g' ? s.nu : 0), 0);
}

export function stepNotes(result: EvaluateResponse, extent_mol: number | null, lookup: SpeciesLookup): StepNote[] {
  const notes: StepNote[] = [];
  const dH = result.deltaH0_kJ;
  if (dH < HEAT_RELEASE_THRESHOLD_KJ) {
    const total = extent_mol === null ? '' : ` (${num(-dH * extent_mol)} kJ released for this route’s amount)`;
    notes.push({
      code: 'HEAT_RELEASE',
      value: dH,
      message: `Strongly exothermic: ΔH° = ${num(dH)} kJ per mol of reaction${total}, beyond the ${HEAT_RELEASE_THRESHOLD_KJ} kJ/mol mark (common practice). This is a thermodynamic screen only; heat removal and runaway risk need a process-safety assessment.`,
    });
  }
  const dn = gasMoleChange(result, lookup);
  if (dn > 0) {
    notes.push({
      code: 'GAS_EVOLUTION',
      value: dn,
      message: `Gives off gas: ${num(dn)} mol more gas per mol of reaction. Pressure build-up and venting need a process-safety assessment.`,
    });
  }
  return notes;
}
