'use client';

import { useMemo } from 'react';
import { EquationText } from '@/components/chemistry/equation-text';
import { namesOf, structuresFromSpecies } from '@/components/chemistry/structure-brief';
import { ClassBadge } from '@/components/ladder/class-badge';
import { formatEnergy, formatTemperature, type EnergyUnit, type TemperatureUnit } from '@/components/ladder/energy-format';
import { temperatureKOf } from '@/lib/route-editor/temperature-text';
import type { StepInput } from '@/lib/schemas/route';
import type { RouteStepResult } from '@/lib/thermo/route';
import { useRouteEditorStore } from '@/stores/route-editor-store';
import { StepResult } from './step-result';

/** The number in "Step n", so the list follows the numbering the ladder, the panels and the discussion use. */
function stepNumber(label: string | undefined): number {
  const n = Number(/^Step (\d+)/.exec(label ?? '')?.[1]);
  return Number.isFinite(n) && n > 0 ? n : Number.POSITIVE_INFINITY;
}

function DeltaG({ result, unit }: { result: RouteStepResult | undefined; unit: EnergyUnit }) {
  const engine = result?.result ?? null;
  if (!result) return <span className="text-ink-faint">not evaluated yet</span>;
  if (!engine) return <span className="text-uphill">{result.error?.message ?? 'could not be evaluated'}</span>;
  const name = engine.deltaG_kJ === null ? 'ΔG°' : 'ΔG';
  return (
    <span className="tabular-nums">
      {name} {formatEnergy(engine.deltaG_kJ ?? engine.deltaG0_kJ, unit, { perMol: true })}
    </span>
  );
}

function StepItem({
  step,
  label,
  result,
  units,
  isSelected,
  onSelect,
}: {
  step: StepInput;
  label: string;
  result: RouteStepResult | undefined;
  units: { energyUnit: EnergyUnit; temperatureUnit: TemperatureUnit };
  isSelected: boolean;
  onSelect: (id: string | null) => void;
}) {
  const engine = result?.result ?? null;
  const names = useMemo(() => namesOf(engine?.species.length ? structuresFromSpecies(engine.species) : null), [engine]);
  const T = engine?.temperature_K ?? temperatureKOf(step.temperature);
  return (
    <li className={`rounded-md border ${isSelected ? 'border-brass-500 bg-brass-100/40' : 'border-paper-edge'}`} data-testid="read-only-step">
      <button type="button" aria-expanded={isSelected} onClick={() => onSelect(isSelected ? null : step.id)} className="flex w-full flex-col gap-1 px-3 py-2 text-left">
        <span className="flex flex-wrap items-center justify-between gap-2">
          <span className="font-semibold">{label}</span>
          {result ? <ClassBadge cls={result.class} isSignUncertain={result.signUncertain} /> : null}
        </span>
        <span className="break-words text-sm">{step.equation ? <EquationText equation={step.equation} names={names} /> : <span className="text-ink-faint">blank step</span>}</span>
        <span className="flex flex-wrap justify-between gap-x-3 text-xs text-ink-soft">
          <span>T {T === null ? (step.temperature ?? '') : formatTemperature(T, units.temperatureUnit)}</span>
          <DeltaG result={result} unit={units.energyUnit} />
        </span>
      </button>
      {isSelected ? (
        <div className="border-t border-paper-edge px-3 py-2">
          <StepResult result={result} energyUnit={units.energyUnit} temperatureUnit={units.temperatureUnit} />
        </div>
      ) : null}
    </li>
  );
}

/**
 * The route page on a phone: the steps as a list in route order, each with its ΔG and class, read-only. Drawing,
 * linking and editing steps need the board, which opens on screens 768 px wide or more; the ladder, the remedies
 * (to read) and the discussion follow below as on the wide page. Tapping a step selects it there too.
 */
export function RouteReadOnlyView({
  results,
  stepLabels,
  units,
}: {
  results: Map<string, RouteStepResult>;
  stepLabels: Record<string, string>;
  units: { energyUnit: EnergyUnit; temperatureUnit: TemperatureUnit };
}) {
  const steps = useRouteEditorStore((s) => s.doc.steps);
  const selectedStepId = useRouteEditorStore((s) => s.selectedStepId);
  const selectStep = useRouteEditorStore((s) => s.selectStep);
  const ordered = useMemo(
    () => steps.map((step, i) => ({ step, i })).sort((a, b) => stepNumber(stepLabels[a.step.id]) - stepNumber(stepLabels[b.step.id]) || a.i - b.i).map((x) => x.step),
    [steps, stepLabels],
  );

  return (
    <section aria-labelledby="read-only-steps-heading" className="flex flex-col gap-2 rounded-lg border border-paper-edge bg-white p-3" data-testid="route-read-only">
      <h2 id="read-only-steps-heading" className="text-base font-semibold">
        Steps
      </h2>
      <p className="text-xs text-ink-soft">Read-only on a phone. Open this route on a screen at least 768 px wide to draw, link and edit steps on the board.</p>
      {ordered.length === 0 ? (
        <p className="text-sm text-ink-faint">No steps yet.</p>
      ) : (
        <ol className="flex flex-col gap-2">
          {ordered.map((step) => (
            <StepItem
              key={step.id}
              step={step}
              label={stepLabels[step.id] ?? 'Step'}
              result={results.get(step.id)}
              units={units}
              isSelected={step.id === selectedStepId}
              onSelect={selectStep}
            />
          ))}
        </ol>
      )}
    </section>
  );
}
