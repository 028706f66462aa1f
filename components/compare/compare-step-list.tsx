'use client';

// The steps under a compared ladder: the equation typeset, its structures small, and where each value came from —
// library (with its source), team (with its provenance) or estimate (method and σ) — as a mark plus visible words,
// so the printed report says it too. A step whose sign is within σ says so.
import { EquationText } from '@/components/chemistry/equation-text';
import { OriginMark } from '@/components/chemistry/origin-mark';
import type { OriginFacts, ValueOrigin } from '@/components/chemistry/origin-text';
import { stepOrigin, stepOriginLines, type StepOriginSummary } from '@/components/chemistry/step-origin';
import { hasDrawing, namesOf, structuresFromSpecies } from '@/components/chemistry/structure-brief';
import { StructureStrip } from '@/components/chemistry/structure-strip';
import type { LadderStep, RouteLadder } from '@/lib/compare/compare-types';
import type { EnergyUnit } from '../ladder/energy-format';
import { sigmaText, stepSignUncertainText } from '../ladder/ladder-uncertainty';

function originFacts(origin: ValueOrigin, summary: StepOriginSummary): OriginFacts {
  if (origin === 'library') return { origin, source: summary.sources.join('; ') };
  if (origin === 'team') return { origin, source: summary.teamSources.join('; ') };
  return { origin, method: summary.methods.join('; ') };
}

function StepItem({ step, index, isShared, unit, isPrint }: { step: LadderStep; index: number; isShared: boolean; unit: EnergyUnit; isPrint: boolean }) {
  const structures = structuresFromSpecies(step.species);
  const summary = stepOrigin(step.species);
  const lines = stepOriginLines(summary, step.sigma_kJ === null ? null : sigmaText(step.sigma_kJ, unit));
  const label = `step ${index + 1}`;
  return (
    <li className={`flex flex-col gap-0.5 py-1 ${isShared ? 'text-brass-700' : ''}`} data-testid="compare-step" data-origin={summary.origin ?? 'none'}>
      <p className={isShared ? 'font-semibold' : ''}>
        <EquationText equation={step.equation || 'blank step'} names={namesOf(structures)} />
        {isShared ? <span> (shared)</span> : null}
      </p>
      {hasDrawing(structures) ? <StructureStrip structures={structures} label={label} loading={isPrint ? 'eager' : 'lazy'} /> : null}
      {lines.length ? (
        <ul className="flex flex-col gap-0.5 text-[10px] leading-tight text-ink-soft" aria-label={`Where the values of ${label} came from`}>
          {lines.map((line) => (
            <li key={line.origin} className="flex items-start gap-1">
              <OriginMark facts={originFacts(line.origin, summary)} className="shrink-0" />
              <span className="min-w-0 break-words">{line.text.replace(/^[^:]+:\s*/, '')}</span>
            </li>
          ))}
        </ul>
      ) : null}
      {step.signUncertain ? (
        <p className="text-[10px] font-medium text-ink" data-testid="compare-step-sign-uncertain">
          ± The sign of this step is within its uncertainty ({stepSignUncertainText(step.sigma_kJ, unit)}).
        </p>
      ) : null}
      {step.error ? <p className="text-[10px] text-uphill">Not evaluated: {step.error}</p> : null}
    </li>
  );
}

export function CompareStepList({ ladder, sharedStepIds, unit, isPrint = false }: { ladder: RouteLadder; sharedStepIds: ReadonlySet<string>; unit: EnergyUnit; /** the printable report: drawings load at once */ isPrint?: boolean }) {
  const byId = new Map(ladder.steps.map((s) => [s.id, s]));
  return (
    <>
      {ladder.overallSignUncertain ? (
        <p className="text-xs font-medium text-ink" data-testid="compare-route-sign-uncertain">
          ± The sign of this route’s total is within its uncertainty (|ΔG| ≤ σ = {ladder.overallSigma_kJ == null ? 'unknown' : sigmaText(ladder.overallSigma_kJ, unit, false)} per mol of target).
        </p>
      ) : null}
      <ol className="flex list-decimal flex-col divide-y divide-paper-edge pl-5 text-[11px] text-ink-soft">
        {ladder.order.map((id, index) => {
          const step = byId.get(id);
          return step ? <StepItem key={id} step={step} index={index} isShared={sharedStepIds.has(id)} unit={unit} isPrint={isPrint} /> : null;
        })}
      </ol>
    </>
  );
}
