// What a search box's text could be besides a name: a CAS number, an InChIKey, or a formula ("C8H10O",
// "CH3COOH", written in any order and brought to Hill order). Pure; the search index decides what to do with it.
import { countFormula } from '../formula';

const CAS = /^\d{2,7}-\d{2}-\d$/;
const INCHIKEY = /^[A-Z]{14}-[A-Z]{10}-[A-Z]$/;
// A formula starts with an element symbol and holds only symbols, counts and brackets ("C6H5CH(OH)CH3").
const FORMULA_TEXT = /^[A-Z][A-Za-z0-9()[\]]*$/;

export function normaliseQuery(text: string): string {
  return text.trim().toLowerCase().replace(/\s+/g, ' ');
}

export function asCas(text: string): string | null {
  const t = text.trim();
  return CAS.test(t) ? t : null;
}

export function asInchikey(text: string): string | null {
  const t = text.trim().toUpperCase();
  return INCHIKEY.test(t) ? t : null;
}

/** Hill order: C, then H, then the rest alphabetically; without carbon, all alphabetically. */
export function hillFormula(elements: Readonly<Record<string, number>>): string {
  const symbols = Object.keys(elements).filter((e) => elements[e]! > 0);
  const order = symbols.includes('C')
    ? ['C', ...(symbols.includes('H') ? ['H'] : []), ...symbols.filter((e) => e !== 'C' && e !== 'H').sort()]
    : symbols.sort();
  return order.map((e) => (elements[e] === 1 ? e : `${e}${elements[e]}`)).join('');
}

/**
 * The Hill formula a query stands for, or null when it cannot be one. A single word of capitals that parses as
 * symbols ("CO", "NaCl") counts; a capitalised name ("Ethanol") does not, as "Et" is no element.
 */
export function asFormula(text: string): string | null {
  const t = text.trim();
  if (!FORMULA_TEXT.test(t)) return null;
  try {
    const { elements } = countFormula(t);
    const hill = hillFormula(elements);
    return hill || null;
  } catch {
    return null;
  }
}

/** A CAS number standing in for a name (about 6,400 rows of the identifier table have one as their name). */
export function looksLikeCas(text: string): boolean {
  return CAS.test(text.trim());
}
