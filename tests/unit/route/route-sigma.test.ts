// σ of a route's total (the counted steps' ξ·σ(ΔrG°) in quadrature) and its sign-uncertain flag, and labels of the
// steps' species maps read by the target and the links. Reaction values: NBS Tables 1982 (Wagman et al.) through the
// engine; ethanol, acetaldehyde, acetic acid and ethyl acetate are library species (lib/thermo/data/organic-library.json).
import { beforeAll, describe, expect, it } from 'vitest';
import { evaluateRoute, type RouteEvaluateRequest, type RouteStepResult } from '@/lib/thermo/route';
import { routeSigma } from '@/lib/thermo/route/route-sigma';
import { sharedStepLabels } from '@/lib/thermo/route/route-labels';
import { builtinLookup, nbsLookup } from '@/lib/thermo/species-library';
import { loadChem } from '@/lib/thermo/structure/chem';
import { structureLookup, type StructureLookup } from '@/lib/thermo/structure/structure-lookup';
import { ammoniumChlorideTree } from './route-fixtures';

type SigmaStep = Pick<RouteStepResult, 'result' | 'extent_mol'>;
// Just the fields routeSigma reads; species keys stand for shared intermediates.
function step(extent: number | null, sigma: number | null, keys: string[] = [], upperBound = false): SigmaStep {
  const species = keys.map((key) => ({ key, sigma_dfG_kJ: 1 }));
  return { extent_mol: extent, result: { uncertainty: { deltaG0_kJ: sigma, signUncertain: false, sources: [], upperBound }, species } as unknown as RouteStepResult['result'] };
}

describe('routeSigma', () => {
  it('adds ξ·σ of the counted steps in quadrature: 2·3 and 1·8 give 10 (a 6-8-10 triangle)', () => {
    const s = routeSigma([step(2, 3, ['A']), step(1, 8, ['B'])], -25);
    expect(s.sigma_kJ).toBeCloseTo(10, 12);
    expect(s.signUncertain).toBe(false);
    expect(s.upperBound).toBe(false);
  });

  it('leaves out steps without an extent or a result, and answers null when no step has a σ', () => {
    expect(routeSigma([step(null, 50), step(1, 4)], -1).sigma_kJ).toBeCloseTo(4, 12);
    expect(routeSigma([{ extent_mol: 1, result: null }, step(1, null)], -1)).toEqual({ sigma_kJ: null, signUncertain: false, upperBound: false });
  });

  it('calls the total sign-uncertain when |ΔG| ≤ σ, including the edge', () => {
    expect(routeSigma([step(1, 5)], -5).signUncertain).toBe(true);
    expect(routeSigma([step(1, 5)], 4.9).signUncertain).toBe(true);
    expect(routeSigma([step(1, 5)], -5.0001).signUncertain).toBe(false);
  });

  it('marks σ as an upper bound when an intermediate stands in two steps, or a step σ already is one', () => {
    expect(routeSigma([step(1, 3, ['A', 'X']), step(1, 4, ['X', 'B'])], -20).upperBound).toBe(true);
    expect(routeSigma([step(1, 3, ['A'], true)], -20).upperBound).toBe(true);
  });
});

describe('overall σ in evaluateRoute', () => {
  it('equals the quadrature sum over the steps the engine returned (ammonium chloride from NH3 and HCl)', () => {
    const r = evaluateRoute(ammoniumChlorideTree(), { lookup: nbsLookup });
    const terms = r.steps.filter((s) => s.result && s.extent_mol !== null && s.result.uncertainty.deltaG0_kJ !== null).map((s) => s.extent_mol! * s.result!.uncertainty.deltaG0_kJ!);
    expect(terms.length).toBeGreaterThan(0);
    expect(r.overall.overallSigma_kJ).toBeCloseTo(Math.hypot(...terms), 9);
    // ΔG ≈ −45.9 (NH3, ξ ½) − 95.3 (HCl, ξ ½) − 91.1 kJ: far outside any tabulated σ.
    expect(r.overall.overallSignUncertain).toBe(false);
  });

  it('says the total is sign-uncertain near equilibrium (N2O4 ⇌ 2 NO2 at 1 and 0.5 bar, ΔG ≈ +1.3 kJ/mol)', () => {
    const r = evaluateRoute({ target: 'NO2(g)', steps: [{ id: 'x', equation: 'N2O4(g) -> 2 NO2(g)', pressures: { 'N2O4(g)': '1 bar', 'NO2(g)': '0.5 bar' } }] }, { lookup: nbsLookup });
    expect(r.steps[0]!.signUncertain).toBe(true);
    expect(r.overall.overallSigma_kJ).not.toBeNull();
    expect(Math.abs(r.overall.deltaG_kJ)).toBeLessThanOrEqual(r.overall.overallSigma_kJ!);
    expect(r.overall.overallSignUncertain).toBe(true);
  });
});

describe('labels of the steps for the target and the links', () => {
  let lookup: StructureLookup;
  beforeAll(async () => {
    lookup = structureLookup(builtinLookup, await loadChem());
  });

  const EtOH = { name: 'ethanol', phase: 'l' as const };
  const request = (secondEtOH: object = EtOH): RouteEvaluateRequest => ({
    target: 'EtOAc',
    steps: [
      { id: 'hydrogenate', equation: 'MeCHO + H2(g) -> EtOH', species: { MeCHO: { name: 'acetaldehyde', phase: 'l' }, EtOH } },
      { id: 'esterify', equation: 'EtOH + AcOH -> EtOAc + H2O(l)', species: { EtOH: secondEtOH as typeof EtOH, AcOH: { smiles: 'CC(=O)O', phase: 'l' }, EtOAc: { smiles: 'CCOC(C)=O', phase: 'l' } } },
    ],
    links: [{ from: 'hydrogenate', to: 'esterify', species: 'EtOH' }],
  });

  it('reads a labelled target and a link drawn between labels, so every step gets its extent', () => {
    const r = evaluateRoute(request(), { lookup, remedies: false });
    expect(r.warnings).toEqual([]);
    expect(r.steps.map((s) => [s.id, s.extent_mol])).toEqual([['hydrogenate', 1], ['esterify', 1]]);
  });

  it('refuses a label two steps bind to different species: the link is named as unreadable', () => {
    const r = evaluateRoute(request({ name: 'methanol', phase: 'l' }), { lookup, remedies: false });
    expect(r.warnings.map((w) => w.code)).toContain('LINK_SPECIES');
    expect(r.steps.find((s) => s.id === 'hydrogenate')!.extent_mol).toBeNull();
  });

  it('shares only labels defined alike, whatever the order of their fields', () => {
    const shared = sharedStepLabels([
      { species: { A: { smiles: 'CCO', phase: 'l' }, B: { name: 'ethanol', phase: 'l' } } },
      { species: { A: { phase: 'l', smiles: 'CCO' } as { smiles: string; phase: 'l' }, B: { name: 'methanol', phase: 'l' } } },
    ]);
    expect([...shared.keys()]).toEqual(['A']);
  });
});
