// Prose that mentions formulas ("T of Step 2 (CO(g) + H2O(g) → CO2(g) + H2(g)) …", an engine warning, a remedy):
// each formula typeset as FormulaText does, arrows as arrows and minus signs as minus signs. Words that only look
// like formulas ("In", "No") come out unchanged, since formulaParts typesets only real counts and charges.
import { Fragment } from 'react';
import { withTrueMinus } from '@/lib/format/numbers';
import { formulaParts, type FormulaPart } from './formula-parts';

// A run of element symbols, counts, groups and hydrate dots, an optional charge, and an optional phase.
const CANDIDATE = /(?<![A-Za-z0-9_{}])((?:[A-Z][a-z]?\d*|\((?:[A-Z][a-z]?\d*)+\)\d*)+(?:[·*]\d*(?:[A-Z][a-z]?\d*|\((?:[A-Z][a-z]?\d*)+\)\d*)+)*(?:[+-]\d*)?)(\([a-z][a-z]{0,3}\))?(?![A-Za-z0-9_])/g;

export interface ChemPiece {
  kind: 'text' | 'formula';
  text: string;
  parts?: FormulaPart[];
}

/** Plain text with its arrows and minus signs put right. */
export function chemPlain(text: string): string {
  return withTrueMinus(text.replace(/\s*(<=>|<->)\s*/g, ' ⇌ ').replace(/\s+->\s+/g, ' → ').replace(/(\S)->(\S)/g, '$1 → $2'));
}

/** The text split into plain runs and typeset formulas. Pure, for tests and for the component below. */
export function chemPieces(text: string): ChemPiece[] {
  const plain = chemPlain(text);
  const out: ChemPiece[] = [];
  let last = 0;
  for (const m of plain.matchAll(CANDIDATE)) {
    const parts = formulaParts(m[0]);
    if (!parts.some((p) => p.kind === 'sub' || p.kind === 'sup')) continue;
    if (m.index > last) out.push({ kind: 'text', text: plain.slice(last, m.index) });
    out.push({ kind: 'formula', text: m[0], parts });
    last = m.index + m[0].length;
  }
  if (last < plain.length) out.push({ kind: 'text', text: plain.slice(last) });
  return out;
}

export function ChemText({ text, className }: { text: string; className?: string }) {
  return (
    <span className={className}>
      {chemPieces(text).map((piece, i) =>
        piece.kind === 'text' ? (
          <Fragment key={i}>{piece.text}</Fragment>
        ) : (
          <span key={i} className="whitespace-nowrap">
            {piece.parts!.map((p, j) => (p.kind === 'sub' ? <sub key={j}>{p.text}</sub> : p.kind === 'sup' ? <sup key={j}>{p.text}</sup> : <Fragment key={j}>{p.text}</Fragment>))}
          </span>
        ),
      )}
    </span>
  );
}
