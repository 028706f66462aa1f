// A formula or species key typeset: counts as subscripts, charges as superscripts, the phase in plain text.
import { Fragment } from 'react';
import { formulaParts, type FormulaOptions } from './formula-parts';

export { formulaParts, formulaPlain, isStructureKey, splitPhase } from './formula-parts';

export function FormulaText({ value, name, formula, className }: { value: string; className?: string } & FormulaOptions) {
  const parts = formulaParts(value, { name, formula });
  return (
    <span className={className ?? 'whitespace-nowrap'}>
      {parts.map((p, i) =>
        p.kind === 'sub' ? <sub key={i}>{p.text}</sub> : p.kind === 'sup' ? <sup key={i}>{p.text}</sup> : <Fragment key={i}>{p.text}</Fragment>,
      )}
    </span>
  );
}
