// The species CSV: which header means which field, and the unit each value column is in.
// Headers are matched loosely ("ΔfH° (kJ/mol)", "dfH [kcal mol-1]", "S_J_per_molK" all work).
import { readEnergyUnit, readEntropyUnit, type EnergyUnit, type EntropyUnit } from './units';

export type ColumnField =
  | 'formula' | 'phase' | 'form' | 'name' | 'aliases'
  | 'dfH' | 'dfG' | 'S' | 'Cp' | 'cpTmin_K' | 'cpTmax_K'
  | 'sigmaDfH' | 'sigmaDfG' | 'sigmaS'
  | 'provenance' | 'reference' | 'notes';

export type ColumnKind = 'text' | 'energy' | 'entropy' | 'temperature';

export interface Column {
  field: ColumnField;
  index: number;
  header: string;
  kind: ColumnKind;
  /** the unit read from the header, or the default when the header names none */
  unit: EnergyUnit | EntropyUnit | 'K' | null;
}

const KIND: Record<ColumnField, ColumnKind> = {
  formula: 'text', phase: 'text', form: 'text', name: 'text', aliases: 'text', provenance: 'text', reference: 'text', notes: 'text',
  dfH: 'energy', dfG: 'energy', sigmaDfH: 'energy', sigmaDfG: 'energy',
  S: 'entropy', Cp: 'entropy', sigmaS: 'entropy',
  cpTmin_K: 'temperature', cpTmax_K: 'temperature',
};

const NAMES: Record<string, ColumnField> = {
  formula: 'formula', phase: 'phase', state: 'phase', form: 'form', polymorph: 'form', name: 'name', aliases: 'aliases', alias: 'aliases',
  dfh: 'dfH', dhf: 'dfH', deltafh: 'dfH', enthalpyofformation: 'dfH',
  dfg: 'dfG', dgf: 'dfG', deltafg: 'dfG', gibbsenergyofformation: 'dfG',
  s: 'S', entropy: 'S', cp: 'Cp', heatcapacity: 'Cp',
  cptmin: 'cpTmin_K', tmin: 'cpTmin_K', cptmax: 'cpTmax_K', tmax: 'cpTmax_K',
  sigmadfh: 'sigmaDfH', udfh: 'sigmaDfH', sigmadfg: 'sigmaDfG', udfg: 'sigmaDfG', sigmas: 'sigmaS', us: 'sigmaS',
  provenance: 'provenance', provenancekind: 'provenance', basis: 'provenance',
  reference: 'reference', citation: 'reference', source: 'reference', method: 'reference',
  notes: 'notes', note: 'notes', comment: 'notes',
};

export const REQUIRED_FIELDS: readonly ColumnField[] = ['formula', 'phase', 'name', 'dfH', 'S', 'provenance', 'reference'];

/** An example header line, shown on the import page and in error messages. */
export const EXAMPLE_HEADER = 'formula,phase,name,aliases,dfH (kJ/mol),dfG (kJ/mol),S (J/(mol K)),Cp (J/(mol K)),provenance,reference';

function splitHeader(header: string): { name: string; unit: string | null } {
  // The unit is the last bracketed group, which may itself hold one pair: "S (J/(mol K))".
  const m = /^(.*?)\s*(?:\(((?:[^()]|\([^()]*\))*)\)|\[([^\]]*)\])\s*$/.exec(header.trim());
  if (!m) return { name: header.trim(), unit: null };
  const name = m[1]!.trim();
  // "σ(ΔfH°)" is a name, not a name with a unit.
  if (!NAMES[foldName(name)] && NAMES[foldName(header)]) return { name: header.trim(), unit: null };
  return { name, unit: (m[2] ?? m[3] ?? '').trim() };
}

function foldName(name: string): string {
  return name.toLowerCase().replace(/δ|∆/g, 'd').replace(/σ/g, 'sigma').replace(/[°º\s_\-.()[\]/]/g, '');
}

export interface HeaderReading {
  columns: Column[];
  problems: string[];
}

/** Reads the header line; every problem is a file-level one (nothing can be previewed without the columns). */
export function readHeader(headers: readonly string[]): HeaderReading {
  const columns: Column[] = [];
  const problems: string[] = [];
  const seen = new Map<ColumnField, string>();
  headers.forEach((header, index) => {
    if (header.trim() === '') return;
    const { name, unit } = splitHeader(header);
    const field = NAMES[foldName(name)];
    if (!field) {
      problems.push(`Column “${header}” is not one we know. Use ${EXAMPLE_HEADER}.`);
      return;
    }
    if (seen.has(field)) {
      problems.push(`Columns “${seen.get(field)}” and “${header}” both give ${field}.`);
      return;
    }
    seen.set(field, header);
    const kind = KIND[field];
    let read: Column['unit'] = null;
    if (kind === 'energy') read = unit === null ? 'kJ/mol' : (readEnergyUnit(unit) ?? null);
    else if (kind === 'entropy') read = unit === null ? 'J/(mol K)' : (readEntropyUnit(unit) ?? null);
    else if (kind === 'temperature') read = unit === null || unit.trim() === 'K' ? 'K' : null;
    if (kind !== 'text' && read === null) {
      const expected = kind === 'energy' ? 'kJ/mol, J/mol, kcal/mol or cal/mol' : kind === 'entropy' ? 'J/(mol K), kJ/(mol K) or cal/(mol K)' : 'K';
      problems.push(`Column “${header}”: the unit “${unit}” is not one we take; use ${expected}.`);
      return;
    }
    columns.push({ field, index, header, kind, unit: read });
  });
  const missing = REQUIRED_FIELDS.filter((f) => !seen.has(f));
  if (missing.length) problems.push(`Missing column${missing.length > 1 ? 's' : ''}: ${missing.join(', ')}. The header should look like ${EXAMPLE_HEADER}.`);
  return { columns, problems };
}
