// Short source names for group entries, read from their shortDesc/longDesc texts (the sources the
// RMG-database entries name; see rmg-groups/README.md, Citations).
import type { TreeEntry } from './group-tree';

const PATTERNS: [RegExp, string][] = [
  [/paraskevas/i, 'Paraskevas et al. 2013'],
  [/vandeputte|CBS-QB3 GA 1D-HR/i, 'Vandeputte (CBS-QB3 group additivity)'],
  [/gillis/i, 'Gillis 2019 (sulfur refit)'],
  [/sumathi/i, 'Sumathi & Green 2002'],
  [/ince|reyniers/i, 'Ince et al. 2015'],
  [/stein.{0,20}fahr|fahr/i, 'Stein & Fahr 1985'],
  [/hexylbenzene|\blai\b/i, 'Lai 2018 (CBS-QB3)'],
  [/goldsmith|DFT_QCI/i, 'Goldsmith, Magoon & Green 2012'],
  [/dorofeeva|\bTHERM\b/, 'THERM (Dorofeeva 1992)'],
  [/janaf/i, 'NIST-JANAF'],
  [/\bRPS\b|REID|PRAUSNITZ/, 'Reid, Prausnitz & Sherwood'],
  [/burcat/i, 'Burcat'],
  [/bozzelli/i, 'Bozzelli'],
  [/benson/i, 'Benson 1976'],
  [/ridge regression|derived from RMG Thermo Libraries|fitted/i, 'RMG fit to thermo libraries'],
  [/pang\b|ranasinghe/i, 'RMG (Pang / Ranasinghe)'],
];

export function entrySource(entry: TreeEntry<unknown>): string {
  const text = `${entry.shortDesc} ${entry.longDesc}`;
  for (const [re, name] of PATTERNS) if (re.test(text)) return name;
  const short = entry.shortDesc.trim();
  return short.length > 0 ? `RMG-database: ${short.slice(0, 60)}` : 'RMG-database (no source named)';
}
