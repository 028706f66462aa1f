// Builds lib/thermo/data/species-library.json from the shared reference data so the committed
// file can be regenerated and diffed. Run: npx tsx scripts/build-species-library.ts
// With --check it only compares and exits 1 if the committed file is stale.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import Papa from 'papaparse';
import { writeOrCheck } from './support/write-or-check';
import { curatedAliases } from './species-aliases';
import { AQUEOUS_RANGE_K, NO_CP_RANGE_K } from '../lib/thermo/species-state';
import type {
  CpModel,
  LibraryPhase,
  SpeciesFlag,
  SpeciesLibraryFile,
  SpeciesRecord,
} from '../lib/thermo/species-types';

const ROOT = path.resolve(__dirname, '..');
const DATA = path.join(ROOT, 'lib/thermo/data/source/thermo');
const OUT = path.join(ROOT, 'lib/thermo/data/species-library.json');

interface CsvRow {
  key: string;
  name: string;
  phase: string;
  formula: string;
  dfH_kJ_per_mol: string;
  dfG_kJ_per_mol: string;
  S_J_per_mol_K: string;
  Cp_J_per_mol_K: string;
  source: string;
  source_ref: string;
}

interface NasaInterval { T_low: number; T_high: number; a: number[]; b: number[] }
interface NasaPhase { nasa_name: string; line: number; T_range_K: [number, number]; intervals: NasaInterval[] }
interface NasaSpecies {
  key: string;
  phases: NasaPhase[];
  at_298_15_K?: { species_csv_values_from?: string; dev_dfH_printed_minus_csv_kJ?: number; nasa_record?: string };
  other_condensed_records_in_file?: string[] | null;
}
interface NasaFile { meta: { form: { R_J_per_mol_K: number } }; species: NasaSpecies[] }

// The NBS table itself says "G-H-S constraint has been relaxed" for these (see data README).
const GHS_RELAXED = new Set(['Na2CO3(s)', 'K2CO3(s)', 'NaHCO3(s)', 'KI(s)', 'NaI(s)', 'K2SO4(s)', 'Na2SO4(s)']);
// NBS Fe(OH)3 is the precipitated solid; the only polynomial is for the crystal.
const CP_FROM_OTHER_FORM = new Set(['Fe(OH)3(s)']);
// Our convention for species without a polynomial (the engine uses the same ranges).
const AQ_RANGE = AQUEOUS_RANGE_K;
const CONSTANT_CP_RANGE = NO_CP_RANGE_K;

const PUBLISHED_UNCERTAINTY: Record<string, { dfH_kJ: number; ref: string }> = {
  'C6H12O6(s)': {
    dfH_kJ: 1.2,
    ref: 'Kabo et al. (2013), ΔfH° = −1273.7 ± 1.2 kJ/mol, as quoted in the Goos–Burcat–Ruscic database (2015); the row value −1273.3 agrees within it',
  },
};
const EXTRA_COMPILATION_DIFFERENCE: Record<string, { dfH_kJ: number; against: string }> = {
  'C12H22O11(s)': { dfH_kJ: 4.9, against: 'CRC Handbook ΔfH° = −2226.1 kJ/mol (from memory) vs NIST WebBook −2221.2' },
};

const SOURCES = [
  'D. D. Wagman, W. H. Evans, V. B. Parker, R. H. Schumm, I. Halow, S. M. Bailey, K. L. Churney, R. L. Nuttall, The NBS Tables of Chemical Thermodynamic Properties: Selected Values for Inorganic and C1 and C2 Organic Substances in SI Units, J. Phys. Chem. Ref. Data 11, Suppl. 2 (1982); erratum J. Phys. Chem. Ref. Data 18, 1807 (1989). NIST digitised release doi:10.18434/M32124.',
  'B. J. McBride, M. J. Zehe, S. Gordon, NASA Glenn Coefficients for Calculating Thermodynamic Properties of Individual Species, NASA/TP-2002-211556 (2002).',
  'NIST Chemistry WebBook, NIST Standard Reference Database 69 (condensed-phase thermochemistry pages; primary references named per row).',
  'CRC Handbook of Chemistry and Physics, "Standard Thermodynamic Properties of Chemical Substances" (values from memory, marked per row).',
  'M. W. Chase, NIST-JANAF Thermochemical Tables, 4th ed., J. Phys. Chem. Ref. Data Monograph 9 (1998) (FeO S° and Cp° from memory).',
  'E. Goos, A. Burcat, B. Ruscic, Extended Third Millennium Ideal Gas and Condensed Phase Thermochemical Database (2015 edition), quoting Kabo et al. (2013) for α-D-glucose.',
];

function num(text: string, what: string, key: string): number {
  const v = Number(text);
  if (text.trim() === '' || !Number.isFinite(v)) throw new Error(`${key}: bad ${what} "${text}"`);
  return v;
}

function parseHill(formula: string): { elements: Record<string, number>; charge: number } {
  const m = /^(.*?)([+-])(\d*)$/.exec(formula);
  const body = m ? m[1]! : formula;
  const charge = m ? (m[2] === '+' ? 1 : -1) * (m[3] ? Number(m[3]) : 1) : 0;
  const elements: Record<string, number> = {};
  const re = /([A-Z][a-z]?)(\d*)/g;
  let consumed = 0;
  for (const t of body.matchAll(re)) {
    elements[t[1]!] = (elements[t[1]!] ?? 0) + (t[2] ? Number(t[2]) : 1);
    consumed += t[0].length;
  }
  if (consumed !== body.length) throw new Error(`cannot read Hill formula "${formula}"`);
  return { elements, charge };
}

function formOf(key: string): string | null {
  const suffix = /\(([^()]+)\)$/.exec(key)?.[1];
  return suffix && !['g', 'l', 's', 'aq'].includes(suffix) ? suffix : null;
}

function flagsOf(row: CsvRow, isElementReference: boolean): SpeciesFlag[] {
  const flags: SpeciesFlag[] = [];
  if (/from memory/i.test(row.source)) flags.push('fromMemory');
  if (/dfG derived/i.test(row.source)) flags.push('dfGDerived');
  if (/erratum/i.test(row.source)) flags.push('errataValue');
  if (GHS_RELAXED.has(row.key)) flags.push('ghsRelaxed');
  if (CP_FROM_OTHER_FORM.has(row.key)) flags.push('cpFromOtherForm');
  if (isElementReference) flags.push('elementReference');
  return flags;
}

function cpOf(row: CsvRow, nasa: NasaSpecies | undefined, R: number, cp298: number | null): CpModel | null {
  if (nasa) {
    return {
      kind: 'nasa9',
      R,
      records: nasa.phases.map((p) => ({
        name: p.nasa_name,
        Tmin: p.T_range_K[0],
        Tmax: p.T_range_K[1],
        intervals: p.intervals.map((i) => ({ Tlow: i.T_low, Thigh: i.T_high, a: i.a, b: i.b })),
      })),
    };
  }
  if (cp298 === null) return null;
  const [Tmin, Tmax] = row.phase === 'aq' ? AQ_RANGE : CONSTANT_CP_RANGE;
  return { kind: 'constant', value: cp298, Tmin, Tmax };
}

function normaliseAlias(name: string): string {
  return name.trim().replace(/\s+/g, ' ');
}

// parenthetical words in the name column that describe a state rather than name the species
const DESCRIPTIVE = new Set(['monomer', 'undissociated', 'precipitated', 'stoichiometric', 'hexagonal', 'dissolved', 'alpha']);

function aliasesFrom(row: CsvRow): string[] {
  const out = new Set<string>();
  const name = normaliseAlias(row.name);
  out.add(name);
  const paren = /^(.*?)\s*\(([^()]*)\)$/.exec(name);
  if (paren) {
    out.add(paren[1]!);
    // "(ethene)"-style synonyms, not descriptions such as "(dissolved, undissociated)"
    const inner = paren[2]!;
    if (/^[A-Za-z0-9-]+$/.test(inner) && !DESCRIPTIVE.has(inner.toLowerCase())) out.add(inner);
  }
  // "iron, alpha" → "iron" for the default form only; a named polymorph keeps its own key
  const comma = /^([^,(]+), /.exec(name);
  if (comma && formOf(row.key) === null) out.add(comma[1]!);
  for (const extra of curatedAliases[row.key] ?? []) out.add(normaliseAlias(extra));
  return [...out];
}

function buildRecord(row: CsvRow, nasa: NasaSpecies | undefined, R: number): SpeciesRecord {
  const { elements, charge } = parseHill(row.formula);
  const dfH = num(row.dfH_kJ_per_mol, 'dfH', row.key);
  const dfG = num(row.dfG_kJ_per_mol, 'dfG', row.key);
  const cp298 = row.Cp_J_per_mol_K.trim() === '' ? null : num(row.Cp_J_per_mol_K, 'Cp', row.key);
  const elementKeys = Object.keys(elements);
  const isElementReference =
    dfH === 0 && dfG === 0 && charge === 0 && elementKeys.length === 1 && row.key !== 'H+(aq)';
  const at = nasa?.at_298_15_K;
  let compilationDifference: SpeciesRecord['compilationDifference'] = EXTRA_COMPILATION_DIFFERENCE[row.key] ?? null;
  if (at && at.species_csv_values_from?.startsWith('NBS') && typeof at.dev_dfH_printed_minus_csv_kJ === 'number') {
    compilationDifference = {
      dfH_kJ: Math.abs(at.dev_dfH_printed_minus_csv_kJ),
      against: `NASA Glenn 2002, ${at.nasa_record ?? 'record covering 298.15 K'}`,
    };
  }
  const published = PUBLISHED_UNCERTAINTY[row.key];
  // Our own wording for the one corrected row's note; the citation itself is kept as given.
  const note = row.source.replace(/\w+ error in CSV/, 'copying error in the digitised NBS file');
  const source = GHS_RELAXED.has(row.key) ? `${note}; G-H-S constraint relaxed in the NBS table` : note;
  return {
    key: row.key,
    name: row.name,
    aliases: aliasesFrom(row),
    phase: row.phase as LibraryPhase,
    form: formOf(row.key),
    formula: row.formula,
    elements,
    charge,
    dfH_kJ: dfH,
    dfG_kJ: dfG,
    S_J_per_K: num(row.S_J_per_mol_K, 'S', row.key),
    Cp_J_per_K: cp298,
    uncertainty: { dfH_kJ: published?.dfH_kJ ?? null, dfG_kJ: null, S_J_per_K: null },
    uncertaintyRef: published?.ref ?? null,
    compilationDifference,
    source,
    sourceRef: row.source_ref,
    flags: flagsOf(row, isElementReference),
    cp: cpOf(row, nasa, R, cp298),
    otherStateRecords: (nasa?.other_condensed_records_in_file ?? []).map((r) => r.replace(/\s*\(line \d+\)$/, '')),
  };
}

function checkAliasClashes(records: SpeciesRecord[]): void {
  const seen = new Map<string, string>();
  for (const r of records) {
    for (const a of r.aliases) {
      const k = `${a.toLowerCase()}|${r.form ?? r.phase}`;
      const prev = seen.get(k);
      if (prev && prev !== r.key) throw new Error(`alias "${a}" (${r.phase}) names both ${prev} and ${r.key}`);
      seen.set(k, r.key);
    }
  }
}

function main(): void {
  const csv = Papa.parse<CsvRow>(readFileSync(path.join(DATA, 'species-298.csv'), 'utf8'), {
    header: true,
    skipEmptyLines: true,
  });
  if (csv.errors.length > 0) throw new Error(`CSV: ${csv.errors[0]!.message}`);
  const nasaFile = JSON.parse(readFileSync(path.join(DATA, 'nasa9-coefficients.json'), 'utf8')) as NasaFile;
  const nasaByKey = new Map(nasaFile.species.map((s) => [s.key, s]));
  const R = nasaFile.meta.form.R_J_per_mol_K;
  const species = csv.data.map((row) => buildRecord(row, nasaByKey.get(row.key), R));
  checkAliasClashes(species);
  const out: SpeciesLibraryFile = {
    meta: {
      standardPressure_bar: 1,
      referenceTemperature_K: 298.15,
      generatedBy: 'scripts/build-species-library.ts from lib/thermo/data/source/thermo/{species-298.csv,nasa9-coefficients.json}',
      sources: SOURCES,
      notes: [
        'Energies in kJ/mol, entropies and heat capacities in J/(mol K), at 298.15 K and 1 bar.',
        'Aqueous species: hypothetical ideal 1 mol/kg solution; ions on the conventional H+(aq) = 0 scale.',
        'cp.kind nasa9: NASA 9-coefficient records (R as given) that chain across phase records; the engine anchors them on the row values at 298.15 K.',
        `cp.kind constant: no polynomial exists; range is our convention (aqueous ${AQ_RANGE.join('–')} K, others ${CONSTANT_CP_RANGE.join('–')} K).`,
        'compilationDifference: |NASA − NBS| in ΔfH° where both compilations have the species; a stand-in for an uncertainty, not a published one.',
      ],
    },
    species,
  };
  const text = `${JSON.stringify(out, null, 1)}\n`;
  if (!writeOrCheck(ROOT, OUT, text)) return;
  console.log(`wrote ${species.length} species to ${path.relative(ROOT, OUT)}`);
}

main();
