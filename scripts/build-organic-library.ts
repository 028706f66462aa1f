// Builds lib/thermo/data/organic-library.json from the committed copy of the sourced organic library
// (lib/thermo/data/source/organics/: species.csv, heat-capacity.json, identifiers.csv).
// Run: npx tsx scripts/build-organic-library.ts   (--check only compares and exits 1 when stale)
//
// - Every organic row (structure with C and H, neutral, closed shell) becomes a species known by structure,
//   keyed {InChIKey}(phase), with its sources per column, names and synonyms, and its best published Cp(T) form.
// - A row that is a substance the NBS/NASA library already has (same composition, phase and a shared name)
//   annotates that record with its structure instead; where the row's value is a newer evaluation (ATcT ΔfH°,
//   JANAF/NASA S°) that differs from NBS 1982, the newer value replaces it and the difference is kept for σ.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import Papa from 'papaparse';
import { writeOrCheck } from './support/write-or-check';
import { loadChem, type Chem } from '../lib/thermo/structure/chem';
import type { CpForm, CpModel, SourceSpread, SpeciesFlag, SpeciesRecord } from '../lib/thermo/species-types';
import { organicKey, type OrganicAnnotation, type OrganicLibraryFile } from '../lib/thermo/structure/organic-format';
import { NO_CP_RANGE_K } from '../lib/thermo/species-state';

const ROOT = path.resolve(__dirname, '..');
const DATA = path.join(ROOT, 'lib/thermo/data/source/organics');
const OUT = path.join(ROOT, 'lib/thermo/data/organic-library.json');
const BASE = path.join(ROOT, 'lib/thermo/data/species-library.json');

// A newer evaluation replaces an NBS 1982 value only when the two differ by more than this (smaller differences
// are within both tables' rounding and would only move long-checked reference values).
const NEWER_DFH_KJ = 0.5;
const NEWER_S_J_PER_K = 1;
const MAX_ALIASES = 12;

interface Row {
  name: string; iupac_or_pubchem_name: string; smiles: string; inchikey: string; cas: string; pubchem_cid: string;
  formula: string; charge: string; phase: string; dfH_kJ_per_mol: string; dfH_sigma_kJ_per_mol: string; dfH_source: string;
  S_J_per_mol_K: string; S_source: string; dfG_kJ_per_mol: string; dfG_source: string; Cp298_J_per_mol_K: string; cp_source: string;
  formula_check: string; flags: string; dfH_all_sources: string; S_all_sources: string; notes: string;
}
interface IdRow { inchikey: string; name: string; synonyms: string }
interface HeatCapacityEntry { form: string; source: string; Tmin: number; Tmax: number; [field: string]: unknown }

function readCsv<T>(file: string): T[] {
  const parsed = Papa.parse<T>(readFileSync(path.join(DATA, file), 'utf8'), { header: true, skipEmptyLines: true });
  if (parsed.errors.length > 0) throw new Error(`${file}: ${parsed.errors[0]!.message} (row ${parsed.errors[0]!.row})`);
  return parsed.data;
}

const num = (text: string): number | null => (text.trim() === '' || !Number.isFinite(Number(text)) ? null : Number(text));

function parseHill(formula: string): Record<string, number> {
  const elements: Record<string, number> = {};
  for (const t of formula.matchAll(/([A-Z][a-z]?)(\d*)/g)) elements[t[1]!] = (elements[t[1]!] ?? 0) + (t[2] ? Number(t[2]) : 1);
  return elements;
}

function sameComposition(a: Record<string, number>, b: Record<string, number>): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const k of keys) if ((a[k] ?? 0) !== (b[k] ?? 0)) return false;
  return true;
}

/** "ATcT -234.570; WebBook -234.000; ..." → the spread (max − min) of the values. */
function spreadOf(text: string): number | null {
  const values = [...text.matchAll(/(-?\d+(?:\.\d+)?)(?:;|$)/g)].map((m) => Number(m[1]));
  if (values.length < 2) return null;
  return Math.max(...values) - Math.min(...values);
}

function sourceSpread(row: Row): SourceSpread | undefined {
  const dfH = spreadOf(row.dfH_all_sources);
  const S = spreadOf(row.S_all_sources);
  if (dfH === null && S === null) return undefined;
  return { dfH_kJ: dfH === null ? null : round(dfH), S_J_per_K: S === null ? null : round(S), values: `ΔfH°: ${row.dfH_all_sources || '—'}; S°: ${row.S_all_sources || '—'}` };
}

const round = (x: number, digits = 3): number => Number(x.toFixed(digits));

function cpModel(entry: HeatCapacityEntry | undefined, cp298: number | null): CpModel | null {
  if (entry) {
    const { source, ...rest } = entry;
    const keep = Object.fromEntries(Object.entries(rest).filter(([k]) => !['name', 'smiles', 'cas', 'phase', 'Cp_298.15K_from_this_form', 'other_forms_in_sources', 'data_type', 'uncertainty_class'].includes(k)));
    return { kind: 'form', source, model: keep as unknown as CpForm };
  }
  if (cp298 === null) return null;
  return { kind: 'constant', value: cp298, Tmin: NO_CP_RANGE_K[0], Tmax: NO_CP_RANGE_K[1] };
}

function flagsOf(row: Row): SpeciesFlag[] {
  const flags: SpeciesFlag[] = [];
  if (row.dfG_source === 'derived') flags.push('dfGDerived');
  if (/dfH_conflict|S_conflict/.test(row.flags)) flags.push('sourcesDisagree');
  return flags;
}

function aliasesOf(row: Row, ids: Map<string, IdRow>): string[] {
  const id = ids.get(row.inchikey);
  const names = [row.name, id?.name ?? '', row.iupac_or_pubchem_name, ...(id?.synonyms ?? '').split('|')]
    .map((n) => n.trim().replace(/\s+/g, ' '))
    // A CAS number or a bare formula is not a name people type with a phase.
    .filter((n) => n.length > 0 && n.length <= 80 && !/^\d+-\d+-\d$/.test(n));
  return [...new Set(names)].slice(0, MAX_ALIASES);
}

function structureOk(chem: Chem, row: Row): boolean {
  try {
    const parsed = chem.parse(row.smiles);
    return parsed.radicalElectrons === 0 && parsed.charge === 0 && sameComposition(parsed.elements, parseHill(row.formula));
  } catch {
    return false;
  }
}

function recordOf(row: Row, ids: Map<string, IdRow>, heat: Map<string, HeatCapacityEntry>): SpeciesRecord | null {
  const dfH = num(row.dfH_kJ_per_mol);
  const S = num(row.S_J_per_mol_K);
  const dfG = num(row.dfG_kJ_per_mol);
  if (dfH === null || S === null || dfG === null) return null;
  const phase = row.phase as 'g' | 'l' | 's';
  const sigma95 = num(row.dfH_sigma_kJ_per_mol);
  const cp298 = num(row.Cp298_J_per_mol_K);
  return {
    key: organicKey(row.inchikey, phase),
    name: row.name,
    aliases: aliasesOf(row, ids),
    phase,
    form: null,
    formula: row.formula,
    elements: parseHill(row.formula),
    charge: 0,
    dfH_kJ: dfH,
    dfG_kJ: dfG,
    S_J_per_K: S,
    Cp_J_per_K: cp298,
    // ATcT publishes 95 % limits (about 2σ).
    uncertainty: { dfH_kJ: sigma95 === null ? null : round(sigma95 / 2), dfG_kJ: null, S_J_per_K: null },
    uncertaintyRef: sigma95 === null ? null : `ATcT 1.112: ±${sigma95} kJ/mol at 95 % confidence, taken as 2σ`,
    compilationDifference: null,
    ...(sourceSpread(row) ? { sourceSpread: sourceSpread(row)! } : {}),
    source: `ΔfH°: ${row.dfH_source}; S°: ${row.S_source}; ΔfG°: ${row.dfG_source === 'derived' ? 'derived from ΔfH° and S° (CODATA element entropies)' : row.dfG_source}`,
    sourceRef: [row.cas ? `CAS ${row.cas}` : '', row.pubchem_cid ? `PubChem CID ${row.pubchem_cid}` : '', row.notes].filter(Boolean).join('; '),
    flags: flagsOf(row),
    cp: cpModel(heat.get(`${row.inchikey}|${phase}`), cp298),
    otherStateRecords: [],
    structure: { smiles: row.smiles, inchikey: row.inchikey, cas: row.cas || null },
  };
}

/** JANAF 1998, or a NASA record whose data-source date ("L 8/88") is after the NBS tables of 1982. */
function isNewerThanNbs(source: string): boolean {
  if (/^JANAF 1998/.test(source)) return true;
  const dated = /^NASA .*\s(\d{1,2})\/(\d{2})\)/.exec(source);
  return dated !== null && Number(dated[2]) > 82;
}

function annotationOf(base: SpeciesRecord, row: Row, record: SpeciesRecord): OrganicAnnotation {
  const structure = record.structure!;
  const dfHNewer = /^ATcT/.test(row.dfH_source) && Math.abs(record.dfH_kJ - base.dfH_kJ) > NEWER_DFH_KJ;
  const sNewer = isNewerThanNbs(row.S_source) && Math.abs(record.S_J_per_K - base.S_J_per_K) > NEWER_S_J_PER_K;
  if (!dfHNewer && !sNewer) return { key: base.key, structure };
  const dfH = dfHNewer ? record.dfH_kJ : base.dfH_kJ;
  const S = sNewer ? record.S_J_per_K : base.S_J_per_K;
  // Shift ΔfG° by exactly the change in ΔfH° − TS°, so the element-reference conventions of the NBS row stay.
  const dfG = round(base.dfG_kJ + (dfH - base.dfH_kJ) - (298.15 * (S - base.S_J_per_K)) / 1000);
  const parts = [dfHNewer ? `ΔfH° ${row.dfH_source} (NBS 1982: ${base.dfH_kJ})` : '', sNewer ? `S° ${row.S_source} (NBS 1982: ${base.S_J_per_K})` : ''].filter(Boolean);
  return {
    key: base.key,
    structure,
    newer: {
      dfH_kJ: dfH, S_J_per_K: S, dfG_kJ: dfG,
      uncertainty: record.uncertainty,
      uncertaintyRef: record.uncertaintyRef,
      compilationDifference: { dfH_kJ: round(Math.abs(record.dfH_kJ - base.dfH_kJ)), against: `NBS 1982 ΔfH° ${base.dfH_kJ} kJ/mol, S° ${base.S_J_per_K} J/(mol K)` },
      note: `Newer evaluation preferred: ${parts.join('; ')}. ΔfG° shifted by the same change in ΔfH° − T·S°.`,
    },
  };
}

async function main(): Promise<void> {
  const chem = await loadChem();
  const rows = readCsv<Row>('species.csv');
  const ids = new Map(readCsv<IdRow>('identifiers.csv').map((r) => [r.inchikey, r]));
  const heatFile = JSON.parse(readFileSync(path.join(DATA, 'heat-capacity.json'), 'utf8')) as { species: Record<string, HeatCapacityEntry> };
  const heat = new Map(Object.entries(heatFile.species));
  const base = (JSON.parse(readFileSync(BASE, 'utf8')) as { species: SpeciesRecord[] }).species;

  const records: SpeciesRecord[] = [];
  const annotations: OrganicAnnotation[] = [];
  const skipped: Record<string, number> = {};
  const skip = (why: string) => { skipped[why] = (skipped[why] ?? 0) + 1; };
  const annotated = new Set<string>();
  for (const row of rows) {
    if (!row.inchikey) { skip('no InChIKey (mostly radicals)'); continue; }
    const record = recordOf(row, ids, heat);
    if (!record) { skip('missing ΔfH°, S° or ΔfG°'); continue; }
    const names = new Set(record.aliases.map((a) => a.toLowerCase()));
    const match = base.find((b) => b.phase === record.phase && b.form === null && b.charge === 0 && sameComposition(b.elements, record.elements) && b.aliases.some((a) => names.has(a.toLowerCase())));
    if (match && !annotated.has(match.key)) {
      annotated.add(match.key);
      annotations.push(annotationOf(match, row, record));
      continue;
    }
    const organic = (record.elements.C ?? 0) > 0 && (record.elements.H ?? 0) > 0;
    if (!organic) { skip('not organic (no C–H) and not in the NBS/NASA library'); continue; }
    if (!structureOk(chem, row)) { skip('radical, charged, or SMILES formula differs'); continue; }
    records.push(record);
  }
  dropClashingAliases([...base, ...records]);
  const out: OrganicLibraryFile = {
    meta: {
      generatedBy: 'scripts/build-organic-library.ts from lib/thermo/data/source/organics/{species.csv,heat-capacity.json,identifiers.csv}',
      standardPressure_bar: 1,
      referenceTemperature_K: 298.15,
      counts: { records: records.length, annotations: annotations.length, newerEvaluations: annotations.filter((a) => a.newer).length, skipped },
      notes: [
        'Sources per column as the organic library names them (ATcT 1.112, JANAF 1998, NASA TM-4513, NIST WebBook, CRC Handbook, API TDB, TRC, Poling, Zabransky, Perry); full citations in lib/thermo/data/source/organics/README.md.',
        `A newer evaluation (ATcT ΔfH°, JANAF or NASA S°) replaces an NBS 1982 value where they differ by more than ${NEWER_DFH_KJ} kJ/mol or ${NEWER_S_J_PER_K} J/(mol K); the difference is kept as compilationDifference.`,
        'sourceSpread: max − min of the values the accepted sources give; the engine uses it as evidence for σ, not as a published σ.',
        'Stereoisomers share their thermodynamic values; the structure keeps the stereo for display and identity.',
      ],
    },
    records,
    annotations,
  };
  const text = `${JSON.stringify(out)}\n`;
  if (!writeOrCheck(ROOT, OUT, text)) return;
  console.log(`wrote ${records.length} organic species and ${annotations.length} annotations (${out.meta.counts.newerEvaluations} newer evaluations) to ${path.relative(ROOT, OUT)}; skipped ${JSON.stringify(skipped)}`);
}

/** A name may name one species per phase; a later record loses a clashing alias (the first keeps it). */
function dropClashingAliases(records: SpeciesRecord[]): void {
  const seen = new Map<string, string>();
  for (const r of records) {
    r.aliases = r.aliases.filter((a) => {
      const k = `${a.toLowerCase()}|${r.form ?? r.phase}`;
      const owner = seen.get(k);
      if (owner && owner !== r.key) return false;
      seen.set(k, r.key);
      return true;
    });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
