// Structure drawings where chemists look (step node, palette, compare and the printable report, which renders the
// compare view): every drawing has a text alternative naming the species and its formula, small inorganics stay
// typeset formulas, equations keep every character as typed while structure keys read as names. The estimated
// route is a real evaluation (RDKit and the estimators); the library reactions are the built-in ones.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { ReactFlowProvider } from 'reactflow';
import { beforeAll, describe, expect, it } from 'vitest';
import { StepNode, type StepNodeData } from '@/components/canvas/step-node';
import { equationRuns } from '@/components/chemistry/equation-parts';
import { EquationText } from '@/components/chemistry/equation-text';
import { formulaSkeleton, hasDrawing, isDrawable, structuresFromSpecies, type StepStructures } from '@/components/chemistry/structure-brief';
import { StructureStrip, structuresSentence } from '@/components/chemistry/structure-strip';
import { CompareStepList } from '@/components/compare/compare-step-list';
import { buildComparison } from '@/lib/compare/build-comparison';
import { routeKeys } from '@/lib/queries/routes';
import { structuresByEquation } from '@/lib/services/routes/palette-structures';
import { searchLibraryReactions } from '@/lib/services/routes/search-library-reactions';
import { evaluateRoute, type RouteEvaluateResponse } from '@/lib/thermo/route';
import { builtinLookup } from '@/lib/thermo/species-library';
import { StepPalette } from '@/app/(app)/routes/[routeId]/_components/step-palette';
import { forComparison, oneStep } from '../compare/compare-fixtures';
import { estimatedEvaluation } from '../ladder/ladder-fixture';

const unescape = (html: string): string => html.replace(/&#x27;/g, "'").replace(/&quot;/g, '"').replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>');

/** Every <img> of the markup with its alt (null when it has none). */
function images(html: string): { src: string; alt: string | null }[] {
  return [...html.matchAll(/<img\b[^>]*>/g)].map((m) => ({ src: /src="([^"]*)"/.exec(m[0])?.[1] ?? '', alt: /alt="([^"]*)"/.exec(m[0])?.[1] ?? null }));
}

/** The alt of every drawing names the species and gives its formula: "name (C8H8O)". */
function expectNamedDrawings(html: string, expected: number) {
  const imgs = images(html);
  expect(imgs).toHaveLength(expected);
  for (const img of imgs) {
    expect(img.src).toMatch(/^\/api\/structures\/svg\?smiles=/);
    expect(img.alt).toMatch(/^\S.* \((?:[A-Z][a-z]?\d*)+\)$/);
  }
}

let estimated: RouteEvaluateResponse;
let kred: StepStructures;
beforeAll(async () => {
  estimated = await estimatedEvaluation();
  kred = structuresFromSpecies(estimated.steps[0]!.result!.species);
});

describe('which species get a drawing', () => {
  it('draws organic skeletons of three or more heavy atoms known by structure, and types the rest', () => {
    expect(formulaSkeleton('C2H6O')).toEqual({ heavyAtoms: 3, carbons: 2, hasHydrogen: true, isOrganic: true });
    expect(isDrawable({ smiles: 'NC(N)=O', formula: 'CH4N2O' })).toBe(true);
    expect(isDrawable({ smiles: 'CCO', formula: 'C2H6O' })).toBe(true);
    expect(isDrawable({ smiles: 'O', formula: 'H2O' })).toBe(false);
    expect(isDrawable({ smiles: '[HH]', formula: 'H2' })).toBe(false);
    expect(isDrawable({ smiles: 'O=C=O', formula: 'CO2' })).toBe(false);
    expect(isDrawable({ smiles: 'CO', formula: 'CH4O' })).toBe(false);
    expect(isDrawable({ smiles: 'O=C([O-])[O-].[Ca+2]', formula: 'CCaO3' })).toBe(false);
    expect(isDrawable({ smiles: null, formula: 'C6H6' })).toBe(false);
  });

  it('reads the estimated step as reactants and products with names, formulas and origins', () => {
    expect(kred.reactants.map((s) => s.asWritten)).toEqual(['ketone', 'IPA']);
    expect(kred.products.map((s) => s.asWritten)).toEqual(['alcohol', 'acetone']);
    for (const s of [...kred.reactants, ...kred.products]) {
      expect(s.origin).toBe('estimated');
      expect(s.name).not.toMatch(/^\{|^[A-Z]{14}-/);
      expect(s.smiles).toBeTruthy();
    }
    expect(hasDrawing(kred)).toBe(true);
    expect(structuresSentence(kred)).toMatch(/^consumes .+ \(C8H8O\), .+ \(C3H8O\); makes .+ \(C8H10O\), .+ \(C3H6O\)$/);
  });
});

describe('structure strip', () => {
  it('shows at most `max` per side and names the rest for screen readers; nothing for a step without species', () => {
    const html = unescape(renderToStaticMarkup(createElement(StructureStrip, { structures: kred, label: 'KRED', max: 1 })));
    expectNamedDrawings(html, 2);
    expect(html).toMatch(/\+1<span class="sr-only"> more: [^<]+ \(C3H8O\)<\/span>/);
    expect(renderToStaticMarkup(createElement(StructureStrip, { structures: { reactants: [], products: [] }, label: 'empty' }))).toBe('');
  });
});

describe('equations typeset as typed', () => {
  it('keeps every character and marks the species terms', () => {
    const equation = 'CO(g) + 2 H2(g) -> CH3OH(g)';
    const runs = equationRuns(equation);
    expect(runs.map((r) => r.text).join('')).toBe(equation);
    expect(runs.filter((r) => r.kind === 'species').map((r) => r.text)).toEqual(['CO(g)', 'H2(g)', 'CH3OH(g)']);
    const html = renderToStaticMarkup(createElement(EquationText, { equation }));
    expect(html).toContain('H<sub>2</sub>(g)');
    expect(html.replace(/<[^>]+>/g, '')).toBe(equation.replace('->', '-&gt;'));
  });

  it('writes a structure key as the species name', () => {
    const html = renderToStaticMarkup(createElement(EquationText, { equation: '{KWOLFJPFCHCOCG-UHFFFAOYSA-N}(l) -> X', names: new Map([['{KWOLFJPFCHCOCG-UHFFFAOYSA-N}(l)', 'acetophenone']]) }));
    expect(html).toContain('acetophenone');
    expect(html).not.toContain('KWOLFJPFCHCOCG');
  });
});

describe('step node', () => {
  const base: StepNodeData = {
    label: 'KRED reduction', equation: 'ketone + IPA -> alcohol + acetone', reactants: ['ketone', 'IPA'], products: ['alcohol', 'acetone'], temperatureText: '30 °C',
    deltaGName: 'ΔG', deltaGText: '−3.2 kJ/mol', cls: 'marginal', signUncertain: true, signUncertainText: '', estimatedText: '', reviewText: '', hasFlags: false, structures: null,
  };
  const node = (data: Partial<StepNodeData>) =>
    unescape(renderToStaticMarkup(createElement(ReactFlowProvider, null, createElement(StepNode, { id: 'kred', data: { ...base, ...data }, selected: false, type: 'step', zIndex: 0, isConnectable: true, xPos: 0, yPos: 0, dragging: false } as never))));

  it('draws each species small with its name and formula as alt text, in a focusable group that says them all', () => {
    const html = node({ structures: kred });
    expectNamedDrawings(html, 4);
    expect(html).toMatch(/<div tabindex="0" role="group" aria-label="Structures of KRED reduction: consumes [^"]+ \(C8H8O\)[^"]*Focus shows them larger\."/);
    for (const img of images(html)) expect(img.src).toContain('w=40&h=30');
    expect(html).toContain('loading="lazy"');
  });

  it('has no drawings before the first evaluation, and keeps the equation as typed', () => {
    const html = node({});
    expect(images(html)).toHaveLength(0);
    expect(html).not.toContain('structure-strip');
    expect(html.replace(/<[^>]+>/g, '')).toContain('ketone + IPA -> alcohol + acetone');
  });
});

describe('palette', () => {
  it('answers the structures of library reactions with an organic skeleton, and none for small inorganics', () => {
    const library = searchLibraryReactions({});
    const structures = structuresByEquation(library.map((r) => r.equation), builtinLookup);
    expect(structures['C2H4(g) + H2O(g) -> C2H5OH(g)']?.products[0]).toMatchObject({ name: 'ethanol', formula: 'C2H6O', smiles: 'CCO' });
    expect(structures['CH4(g) + H2O(g) -> CO(g) + 3 H2(g)']).toBeUndefined();
    expect(structures['CaCO3(s) -> CaO(s) + CO2(g)']).toBeUndefined();
  });

  it('shows each entry’s structures with names and formulas as alt text', () => {
    const library = searchLibraryReactions({});
    const client = new QueryClient();
    const recent = ['C6H5CH3(g) + H2(g) -> C6H6(g) + CH4(g)'];
    client.setQueryData(routeKeys.palette(''), { recent, library, structures: structuresByEquation([...recent, ...library.map((r) => r.equation)], builtinLookup) });
    const html = unescape(renderToStaticMarkup(createElement(QueryClientProvider, { client }, createElement(StepPalette, { onAdd: () => {} }))));
    const alts = images(html).map((i) => i.alt);
    expect(alts).toContain('toluene (C7H8)');
    expect(alts).toContain('benzene (C6H6)');
    expect(alts).toContain('ethanol (C2H6O)');
    expectNamedDrawings(html, alts.length);
    expect(html).toContain('aria-label="Structures of Ethylene hydration: consumes ethylene (ethene) (C2H4), water vapour (H2O); makes ethanol (C2H6O)."');
    // The palette's drawings are no tab stop of their own (its Add buttons are one roving stop).
    expect(html).not.toMatch(/data-testid="structure-strip"[^>]*tabindex="0"|tabindex="0"[^>]*data-testid="structure-strip"/);
  });
});

describe('compare and the printable report', () => {
  it('shows each step’s structures and where every value came from, in words', () => {
    const route = forComparison(oneStep('alcohol', 'ketone + IPA -> alcohol + acetone'), { name: 'KRED', outcome: { evaluation: estimated } });
    const hydration = oneStep('C2H5OH(g)', 'C2H4(g) + H2O(g) -> C2H5OH(g)');
    const tabulated = forComparison(hydration, { name: 'Hydration', outcome: { evaluation: evaluateRoute(hydration, { lookup: builtinLookup }) } });
    const comparison = buildComparison([route, tabulated], {}, builtinLookup);
    const [kredLadder, hydrationLadder] = comparison.routes.map((r) => r.ladder!);
    const kredHtml = unescape(renderToStaticMarkup(createElement(CompareStepList, { ladder: kredLadder!, sharedStepIds: new Set<string>(), unit: 'kJ' })));
    expectNamedDrawings(kredHtml, 4);
    expect(kredHtml).toContain('data-origin="estimated"');
    expect(kredHtml).toMatch(/Estimate<span class="sr-only">: Estimated from the structure by [^<]+<\/span><\/span><span[^>]*>[^<]+ by [^<]+; σ\(ΔrG°\) \d+\.\d kJ\/mol/);
    expect(kredHtml).toContain('The sign of this step is within its uncertainty');
    expect(kredHtml).toContain('The sign of this route’s total is within its uncertainty');
    const hydrationHtml = unescape(renderToStaticMarkup(createElement(CompareStepList, { ladder: hydrationLadder!, sharedStepIds: new Set<string>(), unit: 'kJ' })));
    expectNamedDrawings(hydrationHtml, 1);
    expect(hydrationHtml).toContain('data-origin="library"');
    expect(hydrationHtml).toMatch(/Library<span class="sr-only">: Published value from [^<]+<\/span><\/span><span[^>]*>[^<]+<\/span>/);
    expect(hydrationHtml).not.toContain('Estimate');
    expect(hydrationHtml).toContain('loading="lazy"');
    // The printable report fetches its drawings at once, so none is missing from the printed page.
    const printed = renderToStaticMarkup(createElement(CompareStepList, { ladder: hydrationLadder!, sharedStepIds: new Set<string>(), unit: 'kJ', isPrint: true }));
    expect(printed).toContain('loading="eager"');
    expect(printed).not.toContain('loading="lazy"');
  });
});
