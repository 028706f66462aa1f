'use client';
// What can move the selected step downhill: its class and ΔG, then the engine's temperature, conditions and
// coupling remedies, and the step's process-safety notes and engine warnings. Props in, callbacks out.
import type { ReactNode } from 'react';
import type { CouplingRemedy, RouteStepResult } from '@/lib/thermo/route';
import { Notice } from '@/components/ui/notice';
import { CAUSE_LABEL, causeOf, fieldOfPath, messageAtField } from '@/lib/route-editor/step-errors';
import { ClassBadge } from './class-badge';
import { formatEnergy, formatNumber, temperatureQuantity, type EnergyUnit, type TemperatureUnit } from './energy-format';
import { perMolDeltaG, stepLabelOf } from './ladder-describe';
import { groupRemedies, hasAnyRemedy, stepCautions } from './remedy-groups';
import { remediesAsWritten, textAsWritten } from './remedy-names';
import { stepSignUncertainText } from './ladder-uncertainty';
import { ConditionsSection, CouplingSection, TemperatureSection, type Units } from './remedy-sections';
import { ChemText } from '@/components/chemistry/chem-text';

export const SAFETY_NOTE =
  'These are thermodynamic suggestions only. A change of temperature, pressure or coupling needs a process-safety review before use.';

export interface RemediesPanelProps {
  step: RouteStepResult | null | undefined;
  energyUnit: EnergyUnit;
  temperatureUnit: TemperatureUnit;
  canEdit: boolean;
  onApplyTemperature: (T_K: number) => void;
  onApplyConditions: (patch: { pressures?: Record<string, string>; concentrations?: Record<string, string> }) => void;
  onAddCoupledStep: (equation: string, temperature: string) => void;
  stepLabels?: Record<string, string>;
}

/** The step panel's field an error belongs to, in words: "temperature field", "pressure of CO(g)". */
function fieldWords(path: string | null): string {
  const field = fieldOfPath(path);
  if (field.startsWith('pressure:')) return `pressure of ${field.slice('pressure:'.length)}`;
  if (field.startsWith('concentration:')) return `concentration of ${field.slice('concentration:'.length)}`;
  const words: Record<string, string> = { equation: 'equation', temperature: 'temperature', yieldPct: 'yield', electrons: 'electrons', standardPressure: 'standard pressure' };
  return `${words[field] ?? 'equation'} field`;
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-2">
      <h3 className="text-sm font-semibold text-ink">{title}</h3>
      {children}
    </section>
  );
}

function StepHeader({ step, label, unit }: { step: RouteStepResult; label: string; unit: EnergyUnit }) {
  const r = step.result;
  const mol = perMolDeltaG(step);
  return (
    <header className="flex flex-col gap-1.5 border-b border-paper-edge pb-3">
      <div className="flex flex-wrap items-center gap-2">
        <h2 className="text-base font-semibold text-ink">{label}</h2>
        <ClassBadge cls={step.class} isSignUncertain={step.signUncertain} />
      </div>
      {r ? <p className="break-words text-xs text-ink-soft"><ChemText text={textAsWritten(r.equation, r)} /></p> : null}
      {r ? (
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-xs">
          <dt className="text-ink-faint">{r.deltaG_kJ === null ? 'ΔG (standard state)' : 'ΔG at conditions'}</dt>
          <dd className="font-semibold tabular-nums text-ink">{formatEnergy(mol, unit, { perMol: true })}</dd>
          <dt className="text-ink-faint">ΔG°</dt>
          <dd className="tabular-nums text-ink">{formatEnergy(r.deltaG0_kJ, unit, { perMol: true })}</dd>
          <dt className="text-ink-faint">For the route</dt>
          <dd className="tabular-nums text-ink">
            {step.extent_mol === null || step.deltaG_kJ === null
              ? 'no extent; not in the totals'
              : `${formatEnergy(step.deltaG_kJ, unit)} (${formatNumber(step.extent_mol)} mol of reaction)`}
          </dd>
        </dl>
      ) : null}
      {step.signUncertain ? (
        <p className="text-xs text-brass-700">
          The sign of ΔG is within the data’s uncertainty ({r ? stepSignUncertainText(r.uncertainty.deltaG0_kJ, unit) : 'sign uncertain'}); treat the class with care.
        </p>
      ) : null}
    </header>
  );
}

export function RemediesPanel({
  step,
  energyUnit,
  temperatureUnit,
  canEdit,
  onApplyTemperature,
  onApplyConditions,
  onAddCoupledStep,
  stepLabels,
}: RemediesPanelProps) {
  if (!step) {
    return (
      <aside aria-label="Remedies" className="rounded-lg border border-dashed border-paper-edge bg-white/60 p-4 text-sm text-ink-soft">
        Select a step on the ladder to see what could move it downhill.
      </aside>
    );
  }
  const units: Units = { energy: energyUnit, temperature: temperatureUnit };
  const label = stepLabelOf(step.id, stepLabels);
  const groups = groupRemedies(remediesAsWritten(step));
  const cautions = stepCautions(step);
  const needsRemedy = step.class === 'uphill' || step.class === 'marginal';
  const T_K = step.result?.temperature_K;
  const handleAddCoupled = (r: CouplingRemedy): void => {
    if (T_K !== undefined) onAddCoupledStep(r.combinedEquation, temperatureQuantity(T_K));
  };

  return (
    <aside aria-label={`Remedies for ${label}`} className="flex flex-col gap-4 rounded-lg border border-paper-edge bg-paper p-4">
      <StepHeader step={step} label={label} unit={energyUnit} />

      {step.class === 'error' ? (
        <Notice tone="error" title={`This step could not be evaluated${step.error ? `: ${CAUSE_LABEL[causeOf(step.error)]}` : ''}`}>
          {step.error ? messageAtField(step.error) : 'The engine gave no reason.'}
          {step.error ? <span className="block text-xs opacity-80">Marked at the {fieldWords(step.error.field)} in the step panel.</span> : null}
        </Notice>
      ) : null}

      {step.class === 'downhill' ? <Notice tone="success" title="No remedy needed">This step runs downhill at its conditions.</Notice> : null}

      {needsRemedy ? (
        <div className="flex flex-col gap-4">
          <Notice tone="caution">{SAFETY_NOTE}</Notice>
          {!hasAnyRemedy(groups) ? <p className="text-sm text-ink-soft">The engine found no remedy for this step.</p> : null}
          {groups.temperature.length > 0 ? (
            <Section title="Temperature">
              <TemperatureSection remedies={groups.temperature} units={units} canEdit={canEdit} onApply={onApplyTemperature} />
            </Section>
          ) : null}
          {groups.conditions.length > 0 ? (
            <Section title="Pressures and concentrations">
              <ConditionsSection remedies={groups.conditions} units={units} canEdit={canEdit} onApply={onApplyConditions} />
            </Section>
          ) : null}
          {groups.coupling.length > 0 ? (
            <Section title="Coupling with a driver reaction">
              <CouplingSection remedies={groups.coupling} units={units} canEdit={canEdit && T_K !== undefined} onAdd={handleAddCoupled} />
            </Section>
          ) : null}
          {groups.other.length > 0 ? (
            <Section title="Other suggestions">
              <ul className="list-disc pl-5 text-sm text-ink">
                {groups.other.map((r, i) => (
                  <li key={i}>{r.summary}</li>
                ))}
              </ul>
            </Section>
          ) : null}
        </div>
      ) : null}

      {cautions.length > 0 ? (
        <Section title="Cautions">
          <ul className="flex flex-col gap-2">
            {cautions.map((c) => (
              <li key={c.key}>
                <Notice tone="caution" title={c.title}>
                  {textAsWritten(c.message, step.result)}
                </Notice>
              </li>
            ))}
          </ul>
        </Section>
      ) : null}
    </aside>
  );
}
