// Origin marks and structure images, server-rendered (no DOM in this suite): each origin has its own glyph and word,
// a title and hidden text with the whole sentence; a structure image always has a text alternative.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { OriginMark } from '@/components/chemistry/origin-mark';
import { describeOrigin, formatSigma } from '@/components/chemistry/origin-text';
import { StructureImage, structureAlt, structureSvgPath } from '@/components/chemistry/structure-image';

describe('describeOrigin', () => {
  it('names the library source, the team provenance, and the estimate method with σ in words', () => {
    expect(describeOrigin({ origin: 'library', source: 'NBS 1982', sigma_kJ: 0.2 })).toBe(
      'Published value from NBS 1982; uncertain by about 0.2 kJ/mol (one standard deviation of ΔfG°).',
    );
    expect(describeOrigin({ origin: 'team', source: 'Kestrel Ridge notebook KR-31, p. 2', sigma_kJ: null })).toBe(
      'Your team’s value: Kestrel Ridge notebook KR-31, p. 2; no uncertainty is known.',
    );
    expect(describeOrigin({ origin: 'estimated', method: 'RMG group additivity', source: 'Estimated: RMG group additivity', sigma_kJ: 12.4 })).toBe(
      'Estimated from the structure by RMG group additivity, not measured; uncertain by about 12 kJ/mol (one standard deviation of ΔfG°).',
    );
    expect(describeOrigin({ origin: 'library', source: 'CODATA', sigma_kJ: 0 })).toMatch(/exact by definition/);
    // no σ given at all (the species list has none to say): no claim either way
    expect(describeOrigin({ origin: 'library', source: 'NASA Glenn.' })).toBe('Published value from NASA Glenn.');
  });

  it('rounds σ to what it can say', () => {
    expect(formatSigma(4.25)).toBe('4.3 kJ/mol');
    expect(formatSigma(15.6)).toBe('16 kJ/mol');
  });
});

describe('OriginMark', () => {
  const render = (origin: 'library' | 'team' | 'estimated') =>
    renderToStaticMarkup(createElement(OriginMark, { facts: { origin, source: 'NBS 1982', method: 'Joback', sigma_kJ: 3 } }));

  it('shows a different glyph and word for each origin, not colour alone', () => {
    const html = { library: render('library'), team: render('team'), estimated: render('estimated') };
    expect(html.library).toContain('>Library<');
    expect(html.team).toContain('>Team<');
    expect(html.estimated).toContain('>Estimate<');
    const glyph = (h: string) => /<span aria-hidden="true" class="([^"]+)"/.exec(h)?.[1];
    expect(new Set([glyph(html.library), glyph(html.team), glyph(html.estimated)]).size).toBe(3);
    expect(glyph(html.estimated)).toContain('border-dashed');
    expect(glyph(html.team)).toContain('rotate-45');
  });

  it('carries the whole sentence in the title and in visually hidden text', () => {
    const html = render('estimated');
    const sentence = 'Estimated from the structure by Joback, not measured; uncertain by about 3.0 kJ/mol (one standard deviation of ΔfG°).';
    expect(html).toContain(`title="${sentence}"`);
    expect(html).toContain(`<span class="sr-only">: ${sentence}</span>`);
  });
});

describe('StructureImage', () => {
  it('asks the server for the drawing with the SMILES encoded and the size fixed', () => {
    expect(structureSvgPath('CC(=O)O[H]', 64, 48)).toBe('/api/structures/svg?smiles=CC%28%3DO%29O%5BH%5D&w=64&h=48');
    const html = renderToStaticMarkup(createElement(StructureImage, { smiles: 'CCO', name: 'ethanol', formula: 'C2H6O', width: 64, height: 48 }));
    expect(html).toContain('alt="ethanol (C2H6O)"');
    expect(html).toContain('width="64"');
    expect(html).toContain('height="48"');
    expect(html).toContain('loading="lazy"');
    expect(html).toContain('src="/api/structures/svg?smiles=CCO&amp;w=64&amp;h=48"');
  });

  it('always has a text alternative', () => {
    expect(structureAlt('ethanol', null)).toBe('ethanol');
    expect(structureAlt(null, 'C2H6O')).toBe('C2H6O');
    expect(structureAlt('  ', undefined)).toBe('chemical structure');
  });
});
