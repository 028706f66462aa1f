// The group-tree machinery on its own: SSSR, RMG aromaticity and atom types, the matcher, tree
// descent and data resolution, the generic loader, and the refusals of estimateGas.
import { beforeAll, describe, expect, it } from 'vitest';
import { estimateGas } from '@/lib/thermo/estimate/gas-estimate';
import {
  buildMolecule,
  compileGroup,
  GroupTree,
  loadGroupTrees,
  loadRmgDatabase,
  matchGroup,
  type RmgDatabase,
  smallestRings,
  THERMO_GROUPS_FILE,
} from '@/lib/thermo/estimate/rmg';
import { ThermoError } from '@/lib/thermo/errors';
import { type Chem, loadChem } from '@/lib/thermo/structure/chem';

let chem: Chem;
let db: RmgDatabase;
beforeAll(async () => {
  chem = await loadChem();
  db = loadRmgDatabase();
});

const build = (smiles: string) => buildMolecule(chem, smiles, db.atomTypes);
const sizes = (rings: number[][]) => rings.map((r) => r.length).sort((a, b) => a - b);

describe('smallest set of smallest rings', () => {
  it('is empty for a chain', () => expect(smallestRings(4, [[0, 1], [1, 2], [2, 3]])).toEqual([]));
  it('gives two 6-rings for naphthalene, 5 + 5 for norbornane, 5 × 4 for cubane', () => {
    expect(sizes(build('c1ccc2ccccc2c1').graph.rings)).toEqual([6, 6]);
    expect(sizes(build('C1CC2CCC1C2').graph.rings)).toEqual([5, 5]);
    expect(sizes(build('C12C3C4C1C5C2C3C45').graph.rings)).toEqual([4, 4, 4, 4, 4]);
  });
  it('returns each ring as an ordered cycle', () => {
    const { graph } = build('C1CCCCC1');
    const ring = graph.rings[0]!;
    ring.forEach((a, i) => expect(graph.order(a, ring[(i + 1) % ring.length]!)).toBe(1));
  });
});

describe('molecule representation and atom types (rmg-groups README, section 1)', () => {
  const types = (smiles: string) => {
    const { graph, heavyCount } = build(smiles);
    return graph.atoms.slice(0, heavyCount).map((a) => a.type);
  };
  it('benzene rings get B bonds (Cb), fused carbons Cbf', () => {
    expect(types('c1ccccc1')).toEqual(Array(6).fill('Cb'));
    expect(types('c1ccc2ccccc2c1').filter((t) => t === 'Cbf')).toHaveLength(2);
  });
  it('pyridine and furan stay Kekulé (Cd, N3d, O2s)', () => {
    expect(new Set(types('c1ccncc1'))).toEqual(new Set(['Cd', 'N3d']));
    expect(new Set(types('c1ccoc1'))).toEqual(new Set(['Cd', 'O2s']));
  });
  it('quinoline: the benzo ring is B, the azine ring Kekulé with no double bond on the benzo atoms', () => {
    const { graph } = build('c1ccc2ncccc2c1');
    const t = graph.atoms.map((a) => a.type);
    expect(t.filter((x) => x === 'Cb')).toHaveLength(6);
    for (let i = 0; i < graph.size; i += 1) {
      if (t[i] !== 'Cb') continue;
      for (const j of graph.neighbours[i]!) expect(graph.order(i, j)).not.toBe(2);
    }
  });
  it('nitro N5dc with O2d and O0sc; sulfoxide S4d; sulfone S6dd; amine N3s', () => {
    expect(types('C[N+](=O)[O-]')).toEqual(['Cs', 'N5dc', 'O2d', 'O0sc']);
    expect(types('CS(C)=O')[1]).toBe('S4d');
    expect(types('CS(C)(=O)=O')[1]).toBe('S6dd');
    expect(types('CN')[1]).toBe('N3s');
  });
  it('explicit hydrogens follow the heavy atoms', () => {
    const { graph, heavyCount } = build('CO');
    expect(heavyCount).toBe(2);
    expect(graph.atoms.slice(2).every((a) => a.element === 'H')).toBe(true);
    expect(graph.size).toBe(6);
  });
});

describe('matcher and tree descent', () => {
  it('a group matches only at the centre it describes', () => {
    const group = db.trees.group.get('Cs-CsCsHH')!;
    const graph = db.trees.group.graphOf(group)!;
    const { graph: propane } = build('CCC');
    expect(matchGroup(graph, propane, { '*': 1 })).toBe(true);
    expect(matchGroup(graph, propane, { '*': 0 })).toBe(false);
  });
  it('allows extra molecule atoms (subgraph, not induced) and ignores labels the group lacks', () => {
    const table = db.atomTypes;
    const cc = compileGroup({ kind: 'graph', atoms: [{ id: 1, label: '*', types: ['Cs'], u: [0], p: [], c: [] }, { id: 2, types: ['C'], u: [], p: [], c: [] }], bonds: [{ a: 1, b: 2, orders: ['S'] }] }, table);
    const { graph } = build('CC(C)(C)C');
    expect(matchGroup(cc, graph, { '*': 1, '*9': 0 })).toBe(true);
  });
  it('descends to the first matching child in listed order, then climbs to data and follows references', () => {
    const { graph } = build('CCC');
    const reached = db.trees.group.descend(graph, { '*': 1 })!;
    expect(reached.label).toBe('Cs-CsCsHH');
    const resolved = db.trees.group.followRefs(db.trees.group.withData(reached)!)!;
    expect(resolved.data.H).toBeCloseTo(-20.62712, 4); // Benson's C-(C)2(H)2, −4.93 kcal/mol
  });
  it('loads any group set of the shared layout with a caller-chosen data key', () => {
    const { trees } = loadGroupTrees(THERMO_GROUPS_FILE, (e) => (e.label.length > 0 ? { label: e.label } : null), ['other']);
    expect(trees.other).toBeInstanceOf(GroupTree);
    expect(trees.other!.roots.map((r) => r.label)).toEqual(['R']);
  });
});

describe('estimateGas refuses what the method cannot do', () => {
  const refusal = (smiles: string): ThermoError => {
    try {
      estimateGas(chem, smiles, db);
    } catch (e) {
      if (e instanceof ThermoError) return e;
      throw e;
    }
    throw new Error(`${smiles} was estimated`);
  };
  it('names atoms outside the groups', () => {
    const e = refusal('CP(C)C');
    expect(e.code).toBe('UNSUPPORTED_STRUCTURE');
    expect(e.message).toContain('atom 2 (P)');
  });
  it('refuses radicals and ions', () => {
    expect(refusal('[CH3]').message).toMatch(/radical/);
    expect(refusal('C[NH3+]').message).toMatch(/charge/);
    expect(refusal('CC(=O)[O-]').code).toBe('UNSUPPORTED_STRUCTURE');
  });
  it('refuses mixtures', () => expect(refusal('CCO.O').code).toBe('UNSUPPORTED_STRUCTURE'));
  it('passes on an unreadable SMILES as INVALID_STRUCTURE', () => expect(refusal('C1CC').code).toBe('INVALID_STRUCTURE'));
});

describe('estimateGas output', () => {
  it('ethanol: groups with sources, S° = intrinsic − R ln σ, ΔfG° from CODATA element entropies', () => {
    const e = estimateGas(chem, 'CCO', db);
    expect(e.method).toBe('group-additivity (RMG tree)');
    expect(e.groups.map((g) => g.label).sort()).toEqual(['Cs-CsHHH', 'Cs-CsOsHH', 'O2s-CsH']);
    // The hydroxyl O and its carbon take Benson's ΔfH° pair (Thermochemical Kinetics, 1976: O-(C)(H) −37.9,
    // C-(C)(O)(H)2 −8.1 kcal/mol); S° and Cp stay the tree's (Paraskevas et al. 2013).
    const oxygen = e.groups.find((g) => g.label === 'O2s-CsH')!;
    expect(oxygen.source).toMatch(/^Benson 1976/);
    expect(oxygen.dH_kJ).toBeCloseTo(-37.9 * 4.184, 9);
    expect(e.groups.find((g) => g.label === 'Cs-CsOsHH')!.dH_kJ).toBeCloseTo(-8.1 * 4.184, 9);
    expect(e.symmetryNumber).toBe(3);
    expect(e.S_J_per_K).toBeCloseTo(e.intrinsicS_J_per_K - 8.314462618 * Math.log(3), 9);
    // C 5.74, H2 130.680, O2 205.152 (CODATA, per atom for the diatomics)
    const Selements = 2 * 5.74 + 3 * 130.68 + 205.152 / 2;
    expect(e.dfG_kJ).toBeCloseTo(e.dfH_kJ - (298.15 * (e.S_J_per_K - Selements)) / 1000, 9);
    expect(e.cpPoints.map((p) => p.T_K)).toEqual([300, 400, 500, 600, 800, 1000, 1500]);
    expect(e.cpRange_K).toEqual([298, 1500]);
    expect(e.sigma_dfG_kJ).toBeGreaterThanOrEqual(e.sigma_dfH_kJ);
  });
  it('flags known weak classes as low confidence with a wider σ', () => {
    const pyridine = estimateGas(chem, 'c1ccncc1', db);
    expect(pyridine.confidence).toBe('low');
    expect(pyridine.weakReasons.join(' ')).toMatch(/N-heteroaromatic/);
    const benzoic = estimateGas(chem, 'OC(=O)c1ccccc1', db);
    expect(benzoic.weakKinds).toContain('conjugated-carbonyl-oxygen');
    expect(benzoic.sigma_dfH_kJ).toBeGreaterThan(30);
    expect(estimateGas(chem, 'CCCC', db).confidence).toBe('normal');
  });
  it('names each weak class the rmg-groups README lists (and the measured ones)', () => {
    const kinds = (smiles: string) => estimateGas(chem, smiles, db).weakKinds;
    expect(kinds('O=[N+]([O-])c1ccccc1')).toEqual(expect.arrayContaining(['nitroarene', 'nitro']));
    expect(kinds('C=C=C')).toContain('cumulene');
    expect(kinds('C1CCNCC1')).toContain('copied-ring');
    expect(kinds('O=C1CCCCCN1')).toContain('generic-ring');
    expect(kinds('C1CC2CCC1C=C2')).toContain('ring-heuristic');
    expect(kinds('CCCO')).toEqual(['alcohol']);
  });
  it('widen-only classes keep confidence "normal" but raise σ', () => {
    const thf = estimateGas(chem, 'C1CCOC1', db);
    const cyclopentane = estimateGas(chem, 'C1CCCC1', db);
    expect(thf.confidence).toBe('normal');
    expect(thf.weakKinds).toEqual(['o-s-ring']);
    expect(thf.sigma_S_J_per_K).toBeGreaterThan(2 * cyclopentane.sigma_S_J_per_K);
  });
  it('explicit [H] atoms in the SMILES give the same estimate', () => {
    expect(estimateGas(chem, '[H]C([H])([H])C([H])([H])[H]', db).dfH_kJ).toBeCloseTo(estimateGas(chem, 'CC', db).dfH_kJ, 9);
  });
  it('chiral molecules gain R ln 2 and a stereo note', () => {
    const e = estimateGas(chem, 'CCC(C)O', db);
    expect(e.opticalIsomers).toBe(2);
    expect(e.stereoNote).toBeDefined();
  });
});
