'use client';

import { useCallback, useMemo } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { formatEnergy, type EnergyUnit, type TemperatureUnit } from '@/components/ladder/energy-format';
import { Button } from '@/components/ui/button';
import type { FormUnits } from '@/lib/route-editor/step-form';
import { stepFieldErrors, temperatureRangeNote } from '@/lib/route-editor/step-errors';
import { stepLabels as buildStepLabels, type StepLabel } from '@/lib/route-editor/step-label';
import { totalsWaitField, totalsWaitFieldMessage, totalsWaitReason } from '@/lib/route-editor/totals-wait';
import type { PressureUnit } from '@/lib/schemas/preferences';
import type { StepInput } from '@/lib/schemas/route';
import type { RouteEvaluateResponse, RouteStepResult } from '@/lib/thermo/route';
import { useRouteEditorStore } from '@/stores/route-editor-store';
import { RouteSettingsForm } from './route-settings-form';
import { FitPicker } from '@/app/(app)/fits/_components/fit-picker';
import { StepForm } from './step-form';
import { StepLinks } from './step-links';
import { StepResult } from './step-result';

export interface PanelUnits {
  energyUnit: EnergyUnit;
  temperatureUnit: TemperatureUnit;
  pressureUnit: PressureUnit;
}

function RouteOverview({ evaluation, energyUnit, labels }: { evaluation: RouteEvaluateResponse | undefined; energyUnit: EnergyUnit; labels: ReadonlyMap<string, StepLabel> }) {
  if (!evaluation) return null;
  const o = evaluation.overall;
  // Each step is evaluated on its own; the totals wait until the route is complete, and say why in words.
  if (evaluation.totalsWithheld) {
    return (
      <div className="rounded-md bg-paper px-2 py-1.5 text-xs" data-testid="route-totals-withheld">
        <p className="font-medium text-ink">Route totals wait for a complete route.</p>
        <p className="text-ink-soft">
          {totalsWaitReason(evaluation.totalsWithheld, labels)}
          {evaluation.totalsWithheld.hint ? ` (${evaluation.totalsWithheld.hint})` : ''}
        </p>
      </div>
    );
  }
  return (
    <dl className="grid grid-cols-[1fr_auto] gap-x-2 gap-y-0.5 rounded-md bg-paper px-2 py-1.5 text-xs">
      <dt className="text-ink-soft">Overall ΔG at conditions</dt>
      <dd className="tabular-nums">{formatEnergy(o.deltaG_kJ, energyUnit)}</dd>
      <dt className="text-ink-soft">Overall ΔG°</dt>
      <dd className="tabular-nums">{formatEnergy(o.deltaG0_kJ, energyUnit)}</dd>
      <dt className="text-ink-soft">Uphill / marginal steps</dt>
      <dd className="tabular-nums">
        <span aria-hidden="true">↑</span> {o.uphillSteps} / {o.marginalSteps}
      </dd>
    </dl>
  );
}

export function SidePanel({
  units,
  canEdit,
  evaluation,
  results,
  stale,
  stepLabels,
}: {
  units: PanelUnits;
  canEdit: boolean;
  evaluation: RouteEvaluateResponse | undefined;
  results: Map<string, RouteStepResult>;
  /** steps edited since their result: its errors and figures are out of date */
  stale?: ReadonlySet<string>;
  stepLabels: Record<string, string>;
}) {
  const selectedId = useRouteEditorStore((s) => s.selectedStepId);
  const step = useRouteEditorStore((s) => s.doc.steps.find((x) => x.id === s.selectedStepId));
  // Ids and equations only, so dragging a node does not re-render the links list.
  const stepKeys = useRouteEditorStore(useShallow((s) => s.doc.steps.map((x) => `${x.id}\u0000${x.equation}`)));
  const others = useMemo(() => stepKeys.map((k) => ({ id: k.split('\u0000')[0]!, equation: k.split('\u0000')[1] ?? '' })), [stepKeys]);
  const links = useRouteEditorStore((s) => s.doc.links);
  // Full labels for engine messages that name steps by id (a loop of links, several final steps).
  const fullLabels = useMemo(() => buildStepLabels(others, links), [others, links]);
  const withheld = evaluation?.totalsWithheld;
  const withheldField = totalsWaitField(withheld);
  // A totals problem that belongs to the target or its amount is also said at that field.
  const settingsProblems = useMemo(
    () => (withheld && withheldField ? { [withheldField]: totalsWaitFieldMessage(withheld, fullLabels) } : {}),
    [withheld, withheldField, fullLabels],
  );
  const meta = useRouteEditorStore(
    useShallow((s) => ({ name: s.doc.name, target: s.doc.target, targetAmount: s.doc.targetAmount, marginalThreshold_kJ: s.doc.marginalThreshold_kJ })),
  );
  const { updateStep, updateMeta, removeStep, selectStep, addLink, removeLink } = useRouteEditorStore(
    useShallow((s) => ({ updateStep: s.updateStep, updateMeta: s.updateMeta, removeStep: s.removeStep, selectStep: s.selectStep, addLink: s.addLink, removeLink: s.removeLink })),
  );
  const selectedResult = step ? results.get(step.id) : undefined;
  const isStale = step ? (stale?.has(step.id) ?? false) : false;
  // An edited step's old errors may already be fixed: they show again only if the new answer still has them.
  const engineErrors = useMemo(() => (isStale ? {} : stepFieldErrors(selectedResult?.error)), [isStale, selectedResult]);
  const temperatureNote = isStale ? null : temperatureRangeNote(selectedResult?.result?.warnings ?? []);
  const formUnits: FormUnits = useMemo(() => ({ temperatureUnit: units.temperatureUnit, pressureUnit: units.pressureUnit }), [units.temperatureUnit, units.pressureUnit]);

  const handleStepChange = useCallback(
    (patch: Partial<StepInput>, field: string) => {
      if (selectedId) updateStep(selectedId, patch, { coalesceKey: `step:${selectedId}:${field}` });
    },
    [selectedId, updateStep],
  );
  const handleMetaChange = useCallback((patch: Parameters<typeof updateMeta>[0], field: string) => updateMeta(patch, { coalesceKey: `meta:${field}` }), [updateMeta]);

  if (!step) {
    return (
      <aside aria-label="Route settings" className="flex flex-col gap-3">
        <h2 className="text-sm font-semibold">Route</h2>
        <RouteOverview evaluation={evaluation} energyUnit={units.energyUnit} labels={fullLabels} />
        <RouteSettingsForm meta={meta} energyUnit={units.energyUnit} canEdit={canEdit} onChange={handleMetaChange} engineProblems={settingsProblems} />
        <p className="text-xs text-ink-faint">Select a step on the board or the ladder to edit it.</p>
      </aside>
    );
  }

  return (
    <aside aria-label={`${stepLabels[step.id] ?? 'Step'} details`} className="flex flex-col gap-3">
      <div className="flex items-center justify-between gap-2">
        <h2 className="text-sm font-semibold">{stepLabels[step.id]}</h2>
        <div className="flex gap-1">
          <Button variant="quiet" onClick={() => selectStep(null)}>
            Route settings
          </Button>
          {canEdit ? (
            <Button variant="danger" onClick={() => removeStep(step.id)}>
              Remove step
            </Button>
          ) : null}
        </div>
      </div>
      <StepForm key={step.id} step={step} units={formUnits} canEdit={canEdit} onChange={handleStepChange} engineErrors={engineErrors} temperatureNote={temperatureNote} />
      <fieldset disabled={!canEdit}>
        <FitPicker value={step.fitId ?? null} onChange={(fitId) => handleStepChange({ fitId }, 'fitId')} />
      </fieldset>
      <StepResult result={selectedResult} isStale={isStale} energyUnit={units.energyUnit} temperatureUnit={units.temperatureUnit} stepSpecies={step.species} />
      <StepLinks step={step} steps={others} links={links} stepLabels={stepLabels} canEdit={canEdit} onAddLink={addLink} onRemoveLink={removeLink} />
    </aside>
  );
}
