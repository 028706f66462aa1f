import 'server-only';
import { BoundedMemo } from '../../thermo/bounded-memo';
import { loadChem } from '../../thermo/structure/chem';

/** How many drawings one process keeps; a drawing is a few kB, so this stays under a few MB. */
export const STRUCTURE_CACHE_SIZE = 2000;

// Our ink (ink.soft in tailwind.config.ts, #4a5853) as RDKit's 0–1 RGB, for every element: one muted colour,
// so atoms read by their letters and never compete with the downhill/marginal/uphill hues.
const INK: [number, number, number] = [0x4a / 255, 0x58 / 255, 0x53 / 255];
const PALETTE: Record<string, [number, number, number]> = Object.fromEntries(
  // -1 is RDKit's default entry; 0 the dummy atom; 1–118 the elements.
  Array.from({ length: 120 }, (_, i) => [String(i - 1), INK]),
);

// Options RDKit's MinimalLib reads from the JSON details (MolDraw2DUtils::updateMolDrawOptionsFromJSON):
// clearBackground false leaves out the white rectangle, so the page's paper shows through.
function drawOptions(width: number, height: number): string {
  return JSON.stringify({ width, height, clearBackground: false, atomColourPalette: PALETTE });
}

/**
 * RDKit writes paint as style attributes. API answers carry `default-src 'none'` (next.config.mjs), and a browser
 * that applies an image's own CSP would then drop them and paint every bond black; presentation attributes (fill,
 * stroke, …) are not styles, so the drawing looks the same under any policy.
 */
export function styleToAttributes(svg: string): string {
  return svg.replace(/<[a-zA-Z][^<>]*?\sstyle='([^']*)'[^<>]*>/g, (tag: string, style: string) => {
    const declarations = style
      .split(';')
      .map((d) => d.split(':').map((x) => x.trim()))
      .filter((d): d is [string, string] => d.length === 2 && /^[a-z-]+$/.test(d[0]!) && d[1] !== '');
    let out = tag.replace(/\sstyle='[^']*'/, '');
    for (const [name] of declarations) out = out.replace(new RegExp(`\\s${name}='[^']*'`), '');
    const attributes = declarations.map(([name, value]) => ` ${name}='${value.replace(/'/g, '')}'`).join('');
    return out.replace(/\s*(\/?)>$/, `${attributes} $1>`).replace(/ >$/, '>');
  });
}

export interface StructureDrawing {
  svg: string;
  /** RDKit canonical SMILES of what was drawn */
  smiles: string;
  inchikey: string;
  cached: boolean;
}

interface Entry {
  svg: string;
  smiles: string;
}

const cache = new BoundedMemo<string, Entry>(STRUCTURE_CACHE_SIZE);

/**
 * Canonicalises the SMILES with RDKit and draws it, caching by InChIKey and size. Standard InChI merges some
 * tautomers, so a hit is used only when its canonical SMILES is the same; otherwise the structure is drawn afresh.
 * Unreadable SMILES throw ThermoError INVALID_STRUCTURE (400 through withRoute).
 */
export async function drawStructure({ smiles, width, height }: { smiles: string; width: number; height: number }): Promise<StructureDrawing> {
  const chem = await loadChem();
  const parsed = chem.parse(smiles);
  const key = `${parsed.inchikey || parsed.smiles} ${width}x${height}`;
  const hit = cache.get(key);
  if (hit && hit.smiles === parsed.smiles) return { svg: hit.svg, smiles: parsed.smiles, inchikey: parsed.inchikey, cached: true };
  const svg = styleToAttributes(chem.withMol(parsed.smiles, (mol) => mol.get_svg_with_highlights(drawOptions(width, height))));
  if (!hit) cache.set(key, { svg, smiles: parsed.smiles });
  return { svg, smiles: parsed.smiles, inchikey: parsed.inchikey, cached: false };
}
