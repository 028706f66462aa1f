// Units a species value may be given in, and their factors to the stored units (kJ/mol, J/(mol K)).
// Thermochemical calorie: 1 cal = 4.184 J exactly (the definition the NBS tables use).
export const ENERGY_UNITS = ['kJ/mol', 'J/mol', 'kcal/mol', 'cal/mol'] as const;
export const ENTROPY_UNITS = ['J/(mol K)', 'kJ/(mol K)', 'cal/(mol K)'] as const;
export type EnergyUnit = (typeof ENERGY_UNITS)[number];
export type EntropyUnit = (typeof ENTROPY_UNITS)[number];

const TO_KJ: Record<EnergyUnit, number> = { 'kJ/mol': 1, 'J/mol': 1e-3, 'kcal/mol': 4.184, 'cal/mol': 4.184e-3 };
const TO_J_PER_K: Record<EntropyUnit, number> = { 'J/(mol K)': 1, 'kJ/(mol K)': 1e3, 'cal/(mol K)': 4.184 };

export function toKJPerMol(value: number, unit: EnergyUnit): number {
  return value * TO_KJ[unit];
}

export function toJPerMolK(value: number, unit: EntropyUnit): number {
  return value * TO_J_PER_K[unit];
}

// Spellings seen in spreadsheet headers, folded to one of ours.
function fold(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[·⋅*]/g, ' ')
    .replace(/−/g, '-')
    .replace(/mol\^?-1/g, '/mol')
    .replace(/k\^?-1/g, '/k')
    .replace(/[()\s]/g, '')
    .replace(/\/\//g, '/');
}

const ENERGY_SPELLINGS = new Map<string, EnergyUnit>([
  ['kj/mol', 'kJ/mol'], ['kjmol', 'kJ/mol'],
  ['j/mol', 'J/mol'], ['jmol', 'J/mol'],
  ['kcal/mol', 'kcal/mol'], ['kcalmol', 'kcal/mol'],
  ['cal/mol', 'cal/mol'], ['calmol', 'cal/mol'],
]);

const ENTROPY_SPELLINGS = new Map<string, EntropyUnit>([
  ['j/molk', 'J/(mol K)'], ['j/mol/k', 'J/(mol K)'], ['j/k/mol', 'J/(mol K)'], ['j/kmol', 'J/(mol K)'], ['jmolk', 'J/(mol K)'], ['jmol/k', 'J/(mol K)'],
  ['kj/molk', 'kJ/(mol K)'], ['kj/mol/k', 'kJ/(mol K)'], ['kj/k/mol', 'kJ/(mol K)'], ['kj/kmol', 'kJ/(mol K)'],
  ['cal/molk', 'cal/(mol K)'], ['cal/mol/k', 'cal/(mol K)'], ['cal/k/mol', 'cal/(mol K)'], ['cal/kmol', 'cal/(mol K)'],
  ['eu', 'cal/(mol K)'],
]);

/** Reads a unit as written in a CSV header ("kJ mol-1", "J/(mol·K)"); undefined when it is not one we take. */
export function readEnergyUnit(text: string): EnergyUnit | undefined {
  return ENERGY_SPELLINGS.get(fold(text));
}

export function readEntropyUnit(text: string): EntropyUnit | undefined {
  return ENTROPY_SPELLINGS.get(fold(text));
}
