// Shape of lib/thermo/data/species-library.json (our own format) and of team-supplied species.

export type LibraryPhase = 'g' | 'l' | 's' | 'aq';

export interface Nasa9Interval {
  Tlow: number;
  Thigh: number;
  /** a1..a7 */
  a: number[];
  /** b1, b2 */
  b: number[];
}

export interface Nasa9Record {
  /** name of the phase record in the source file, e.g. "Fe(a)" */
  name: string;
  Tmin: number;
  Tmax: number;
  intervals: Nasa9Interval[];
}

export interface Nasa9Cp {
  kind: 'nasa9';
  /** gas constant the coefficients were generated with */
  R: number;
  /** phase records of one aggregate state, sorted by temperature; they chain */
  records: Nasa9Record[];
}

export interface ConstantCp {
  kind: 'constant';
  value: number;
  Tmin: number;
  Tmax: number;
}

interface Range {
  Tmin: number;
  Tmax: number;
}
interface Piece extends Range {
  coeffs: number[];
}

/** The published Cp(T) forms of the organic library (lib/thermo/data/source/organics/README.md) and an estimate's Wilhoit form. */
export type CpForm =
  | (Range & { form: 'NASA7'; Tmid?: number; low: number[]; high?: number[]; segments?: Piece[] })
  | (Range & { form: 'Shomate'; ranges: Piece[] })
  | (Range & { form: 'TRC'; coeffs: number[] })
  | (Range & { form: 'Poling'; coeffs: number[] })
  | (Range & { form: 'JANAF_table'; T: number[]; Cp: number[] })
  | (Range & { form: 'Zabransky_spline'; segments: Piece[] })
  | (Range & { form: 'Zabransky_quasipolynomial'; coeffs: number[]; Tc: number })
  | (Range & { form: 'DIPPR100_Perry'; coeffs: number[] })
  | (Range & { form: 'Wilhoit'; Cp0: number; CpInf: number; B: number; a: [number, number, number, number] });

export interface FormCp {
  kind: 'form';
  /** who published the form (or the estimation method that made it) */
  source: string;
  model: CpForm;
}

export type CpModel = Nasa9Cp | ConstantCp | FormCp;

/** How a species is known by structure: identity for links and matching, the drawing, the name. */
export interface StructureIdentity {
  /** RDKit canonical isomeric SMILES */
  smiles: string;
  /** standard InChIKey; identity is InChIKey + phase */
  inchikey: string;
  cas: string | null;
}

/** What an estimate adds to a record: the method, the groups it matched with their sources, and how sure it is. */
export interface EstimateInfo {
  method: string;
  groups: { label: string; count: number; source: string; dH_kJ?: number; dS_J_per_K?: number }[];
  confidence: 'normal' | 'low';
  notes: string[];
}

export interface SpeciesUncertainty {
  dfH_kJ: number | null;
  dfG_kJ: number | null;
  S_J_per_K: number | null;
}

/** Spread between compilations that disagree (max − min of the values each gives); evidence for σ, not a published σ. */
export interface SourceSpread {
  dfH_kJ: number | null;
  S_J_per_K: number | null;
  /** the values compared, as "ATcT -235.0; JANAF -234.8" */
  values: string;
}

export type SpeciesFlag =
  | 'fromMemory'
  | 'ghsRelaxed'
  | 'dfGDerived'
  | 'elementReference'
  | 'errataValue'
  | 'cpFromOtherForm'
  /** sources of the organic library still disagree beyond 15 kJ/mol (ΔfH°) or 8 J/(mol K) (S°) */
  | 'sourcesDisagree'
  /** a newer evaluation (ATcT, JANAF) replaced the NBS 1982 value; the difference is kept as evidence for σ */
  | 'newerEvaluation'
  /** values from a group-contribution estimate, not a measurement */
  | 'estimated';

export interface SpeciesRecord {
  key: string;
  name: string;
  aliases: string[];
  phase: LibraryPhase;
  /** polymorph name when the key names a non-default form, e.g. "diamond" */
  form: string | null;
  /** Hill order, charge appended */
  formula: string;
  elements: Record<string, number>;
  charge: number;
  dfH_kJ: number;
  dfG_kJ: number;
  S_J_per_K: number;
  Cp_J_per_K: number | null;
  uncertainty: SpeciesUncertainty;
  /** where the published uncertainty comes from, when there is one */
  uncertaintyRef: string | null;
  /** |ΔfH°(other compilation) − ΔfH°(row)| where both compilations have the species */
  compilationDifference: { dfH_kJ: number; against: string } | null;
  /** organic library rows: how far the accepted sources spread */
  sourceSpread?: SourceSpread;
  source: string;
  sourceRef: string;
  flags: SpeciesFlag[];
  cp: CpModel | null;
  /** records of the same substance in another aggregate state that the data lacks, e.g. "H2O(cr)" */
  otherStateRecords: string[];
  /** set for species known by structure (the organic library, estimates) */
  structure?: StructureIdentity;
  /** set only for estimated species */
  estimate?: EstimateInfo;
}

export interface LibraryMeta {
  standardPressure_bar: number;
  referenceTemperature_K: number;
  generatedBy: string;
  sources: string[];
  notes: string[];
}

export interface SpeciesLibraryFile {
  meta: LibraryMeta;
  species: SpeciesRecord[];
}
