// Structures through RDKit's WebAssembly build: parse, canonicalise, identify (InChIKey) and derive
// formula and charge. The module loads once per process (~0.3 s); every call after that is
// synchronous, so callers await `loadChem()` once and pass the toolkit on.
import initRDKitModule from '@rdkit/rdkit';
import type { MainModule as RDKitModule, Mol as JSMol } from '@rdkit/rdkit';
import { ThermoError } from '../errors';
import { ELEMENT_SYMBOLS } from '../formula';

/** Above this many heavy atoms a structure is refused (a drug-like molecule has under 60). */
export const MAX_HEAVY_ATOMS = 150;
/** Longest SMILES text accepted before parsing. */
export const MAX_SMILES_LENGTH = 600;

const ELEMENTS_BY_Z = ['', ...ELEMENT_SYMBOLS];

export interface ParsedStructure {
  /** RDKit canonical isomeric SMILES */
  smiles: string;
  inchikey: string;
  /** Hill order, charge appended as in the library keys ("C2H3O2-") */
  formula: string;
  elements: Record<string, number>;
  charge: number;
  heavyAtoms: number;
  radicalElectrons: number;
  /** true when the SMILES carries tetrahedral or double-bond stereo */
  hasStereo: boolean;
  /** RDKit's JSON of the parsed molecule (atoms in input order), so the estimator builds its graph without parsing again */
  molJson: RdkitMolJson;
}

export interface Chem {
  readonly rdkit: RDKitModule;
  parse(smiles: string, field?: string): ParsedStructure;
  /** Runs `read` on a parsed molecule and frees its WASM memory afterwards. */
  withMol<T>(smiles: string, read: (mol: JSMol) => T, field?: string): T;
}

let loading: Promise<Chem> | undefined;

export function loadChem(): Promise<Chem> {
  loading ??= initRDKitModule().then(createChem);
  return loading;
}

/** The parts of RDKit's commonchem JSON the engine reads. */
export interface RdkitMolJson {
  defaults: { atom: { z: number; impHs: number; chg: number; nRad: number }; bond: { bo: number } };
  molecules: {
    atoms: { z?: number; impHs?: number; chg?: number; nRad?: number }[];
    bonds?: { bo?: number; atoms: [number, number] }[];
    extensions?: { name: string; aromaticBonds?: number[] }[];
  }[];
}

/** The neutral part of a Hill formula: C, then H, then the rest alphabetically (all alphabetical without carbon). */
export function hillBody(elements: Record<string, number>): string {
  const symbols = Object.keys(elements).filter((e) => elements[e]! > 0);
  const ordered = symbols.includes('C')
    ? ['C', ...(symbols.includes('H') ? ['H'] : []), ...symbols.filter((e) => e !== 'C' && e !== 'H').sort()]
    : symbols.sort();
  return ordered.map((e) => (elements[e] === 1 ? e : `${e}${elements[e]}`)).join('');
}

function hillFormula(elements: Record<string, number>, charge: number): string {
  const body = hillBody(elements);
  if (charge === 0) return body;
  const size = Math.abs(charge) === 1 ? '' : String(Math.abs(charge));
  return `${body}${size}${charge > 0 ? '+' : '-'}`;
}

/** Position (1-based, as RDKit prints it) of a SMILES syntax error, from RDKit's captured log. */
function errorPosition(log: string): number | undefined {
  const m = /around position (\d+)/.exec(log);
  return m ? Number(m[1]) : undefined;
}

function describeFailure(log: string): string {
  if (/unclosed ring/i.test(log)) return 'a ring bond is opened but never closed';
  if (/Explicit valence/i.test(log)) {
    const m = /atom # (\d+) (\w+), (\d+), is greater than permitted/.exec(log);
    return m ? `atom ${Number(m[1]) + 1} (${m[2]}) has ${m[3]} bonds, more than its valence allows` : 'an atom has more bonds than its valence allows';
  }
  if (/kekulize/i.test(log)) return 'an aromatic ring cannot be written with alternating bonds (check lowercase atoms and [nH])';
  if (/syntax error/i.test(log)) return 'the text is not valid SMILES';
  return 'the structure could not be read';
}

function createChem(rdkit: RDKitModule): Chem {
  const log = rdkit.set_log_capture('rdApp.*');

  function open(smiles: string, field: string): JSMol {
    const text = smiles.trim();
    if (text.length === 0) throw new ThermoError('INVALID_STRUCTURE', 'The SMILES is empty.', { field });
    if (text.length > MAX_SMILES_LENGTH) {
      throw new ThermoError('INVALID_STRUCTURE', `A SMILES may be at most ${MAX_SMILES_LENGTH} characters; this one has ${text.length}.`, { field });
    }
    if (/[\s|]/.test(text)) {
      throw new ThermoError('INVALID_STRUCTURE', 'Give one SMILES without spaces or extensions.', { field, position: text.search(/[\s|]/) + 1 });
    }
    log?.clear_buffer();
    const mol = rdkit.get_mol(text);
    if (!mol || !mol.is_valid()) {
      mol?.delete();
      const captured = log?.get_buffer() ?? '';
      const position = errorPosition(captured);
      const where = position === undefined ? '' : ` near position ${position}`;
      throw new ThermoError('INVALID_STRUCTURE', `Cannot read the SMILES "${text}"${where}: ${describeFailure(captured)}.`, {
        field,
        ...(position === undefined ? {} : { position }),
      });
    }
    return mol;
  }

  function withMol<T>(smiles: string, read: (mol: JSMol) => T, field = 'smiles'): T {
    const mol = open(smiles, field);
    try {
      return read(mol);
    } finally {
      mol.delete();
    }
  }

  function parse(smiles: string, field = 'smiles'): ParsedStructure {
    return withMol(
      smiles,
      (mol) => {
        const json = JSON.parse(mol.get_json()) as RdkitMolJson;
        const defaults = json.defaults.atom;
        const atoms = json.molecules.flatMap((m) => m.atoms);
        if (atoms.length > MAX_HEAVY_ATOMS) {
          throw new ThermoError('INVALID_STRUCTURE', `A structure may have at most ${MAX_HEAVY_ATOMS} heavy atoms; this one has ${atoms.length}.`, { field });
        }
        const elements: Record<string, number> = {};
        let charge = 0;
        let radicalElectrons = 0;
        let heavyAtoms = 0;
        for (const atom of atoms) {
          const z = atom.z ?? defaults.z;
          const symbol = ELEMENTS_BY_Z[z];
          if (!symbol) throw new ThermoError('INVALID_STRUCTURE', 'The SMILES holds a dummy or unknown atom (*).', { field });
          elements[symbol] = (elements[symbol] ?? 0) + 1;
          const hydrogens = atom.impHs ?? defaults.impHs;
          if (hydrogens > 0) elements.H = (elements.H ?? 0) + hydrogens;
          charge += atom.chg ?? defaults.chg;
          radicalElectrons += atom.nRad ?? defaults.nRad;
          if (z !== 1) heavyAtoms += 1;
        }
        const canonical = mol.get_smiles();
        const inchi = mol.get_inchi();
        const inchikey = inchi ? rdkit.get_inchikey_for_inchi(inchi) : '';
        return {
          smiles: canonical,
          inchikey,
          formula: hillFormula(elements, charge),
          elements,
          charge,
          heavyAtoms,
          radicalElectrons,
          hasStereo: /[@/\\]/.test(canonical),
          molJson: json,
        };
      },
      field,
    );
  }

  return { rdkit, parse, withMol };
}
