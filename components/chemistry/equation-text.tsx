// An equation as written, its species typeset (counts subscript, charges superscript); structure keys read as names.
import { Fragment } from 'react';
import { equationRuns } from './equation-parts';
import { FormulaText } from './formula-text';

export function EquationText({ equation, names, className }: { equation: string; /** term as written → name, for structure keys */ names?: ReadonlyMap<string, string>; className?: string }) {
  return (
    <span className={className}>
      {equationRuns(equation).map((run, i) =>
        run.kind === 'species' ? <FormulaText key={i} value={run.text} name={names?.get(run.text) ?? null} /> : <Fragment key={i}>{run.text}</Fragment>,
      )}
    </span>
  );
}
