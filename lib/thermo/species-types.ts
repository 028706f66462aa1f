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

export type CpModel = Nasa9Cp | ConstantCp;

export interface SpeciesUncertainty {
  dfH_kJ: number | null;
  dfG_kJ: number | null;
  S_J_per_K: number | null;
}

export type SpeciesFlag =
  | 'fromMemory'
  | 'ghsRelaxed'
  | 'dfGDerived'
  | 'elementReference'
  | 'errataValue'
  | 'cpFromOtherForm';

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
  source: string;
  sourceRef: string;
  flags: SpeciesFlag[];
  cp: CpModel | null;
  /** records of the same substance in another aggregate state that the data lacks, e.g. "H2O(cr)" */
  otherStateRecords: string[];
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
