'use client';

import { useSearchParams } from 'next/navigation';
import { useCallback, useEffect, useMemo, useRef } from 'react';
import type { ReactFlowInstance } from 'reactflow';
import { useShallow } from 'zustand/react/shallow';
import type { LinkAttempt } from '@/components/canvas/route-canvas';
import type { StepDragPayload } from '@/components/canvas/step-drop';
import { temperatureQuantity } from '@/components/ladder/energy-format';
import { FreeEnergyLadder } from '@/components/ladder/free-energy-ladder';
import { RemediesPanel } from '@/components/ladder/remedies-panel';
import { Button } from '@/components/ui/button';
import { placeNewStep } from '@/components/canvas/place-step';
import { NEW_NODE_SIZE } from '@/lib/route-editor/free-placement';
import { linkRefusal } from '@/lib/route-editor/link-rules';
import { stepLabels as buildStepLabels } from '@/lib/route-editor/step-label';
import type { LinkInput, StepInput } from '@/lib/schemas/route';
import { useRouteEditorStore, useRouteEditorStoreApi } from '@/stores/route-editor-store';
import { BoardCanvas } from './board-canvas';
import { ConflictDialog } from './conflict-dialog';
import { RouteWarnings } from './route-warnings';
import { SafetyCaution } from '@/components/safety/safety-caution';
import { SaveStatus } from './save-status';
import { SidePanel, type PanelUnits } from './side-panel';
import { StepPalette } from './step-palette';
import { useAutosave } from './use-autosave';
import { SHORTCUT_HELP, useEditorShortcuts } from './use-editor-shortcuts';
import { useRouteEvaluation } from './use-route-evaluation';
import { ReviewSection } from './review-section';
import { RouteReadOnlyView } from './route-read-only-view';
import { useReviewData } from './use-review-data';
import { WorkflowBar } from './workflow-bar';
import { AlternativesMenu } from './alternatives-menu';
import type { Role } from '@/lib/auth/roles';
import { useIsPhone } from '@/lib/hooks/use-media-query';
import { FormulaText } from '@/components/chemistry/formula-text';

const FIT_OPTIONS = { padding: 0.2, maxZoom: 1.25, duration: 200 };
export { LINK_REFUSAL } from '@/lib/route-editor/link-rules';

export interface ReviewContext {
  teamId: number;
  selfId: number;
  role: Role;
  status: string;
  archived: boolean;
}

export function RouteEditor({ routeId, canEdit, units, review }: { routeId: number; canEdit: boolean; units: PanelUnits; review: ReviewContext }) {
  const store = useRouteEditorStoreApi();
  // Strings, not the steps array: the editor re-renders when ids or equations change, not on every drag frame.
  const equationsKey = useRouteEditorStore((s) => s.doc.steps.map((x) => `${x.id}\u0000${x.equation}`).join('\u0001'));
  const name = useRouteEditorStore((s) => s.doc.name);
  const target = useRouteEditorStore((s) => s.doc.target);
  const selectedStepId = useRouteEditorStore((s) => s.selectedStepId);
  const { canUndo, canRedo } = useRouteEditorStore(useShallow((s) => ({ canUndo: s.past.length > 0, canRedo: s.future.length > 0 })));
  const { evaluation, results, stale, isEvaluating, error } = useRouteEvaluation(routeId);
  const { saveNow } = useAutosave(routeId, { enabled: canEdit });
  const reviewData = useReviewData(routeId, review.teamId);
  // Links from mails and notifications name a step: open the route with it selected.
  const linkedStep = useSearchParams().get('step');
  useEffect(() => {
    if (linkedStep && store.getState().doc.steps.some((s) => s.id === linkedStep)) store.getState().selectStep(linkedStep);
  }, [linkedStep, store]);

  const flow = useRef<ReactFlowInstance | null>(null);
  const canvasBox = useRef<HTMLDivElement>(null);
  const fitView = useCallback(() => flow.current?.fitView(FIT_OPTIONS), []);
  // Phones get the read-only list (route-read-only-view.tsx): no board, no shortcuts that edit.
  const isPhone = useIsPhone();
  useEditorShortcuts({ canEdit: canEdit && !isPhone, onFitView: fitView });

  // "Step n" is the step's place in route order (lib/route-editor/step-label.ts), the same function revisions,
  // notifications and mails use: the board says "Step n", the panels "Step n (what it does)".
  const linksKey = useRouteEditorStore((s) => s.doc.links.map((l) => `${l.from}\u0000${l.to}`).join('\u0001'));
  const allLabels = useMemo(() => {
    const steps = equationsKey.split('\u0001').filter(Boolean).map((entry) => entry.split('\u0000') as [string, string]).map(([id, equation]) => ({ id, equation }));
    const links = linksKey.split('\u0001').filter(Boolean).map((entry) => entry.split('\u0000') as [string, string]).map(([from, to]) => ({ from, to }));
    return buildStepLabels(steps, links);
  }, [equationsKey, linksKey]);
  const stepLabels = useMemo(() => Object.fromEntries([...allLabels].map(([id, l]) => [id, l.short])), [allLabels]);
  const stepTitles = useMemo(() => Object.fromEntries([...allLabels].map(([id, l]) => [id, l.full])), [allLabels]);
  // The ladder already numbers its risers; its labels name the reaction.
  const ladderLabels = useMemo(
    () => Object.fromEntries(equationsKey.split('\u0001').filter(Boolean).map((entry) => entry.split('\u0000') as [string, string]).map(([id, eq]) => [id, eq || 'blank step'])),
    [equationsKey],
  );

  const handleSelectStep = useCallback((id: string | null) => store.getState().selectStep(id), [store]);
  const handleMoveStep = useCallback(
    (id: string, position: StepInput['position'] | undefined, dragging: boolean) => store.getState().moveStep(id, position, { dragging }),
    [store],
  );
  // Drag-linking and the step panel's "Link product to…" share these rules and words (lib/route-editor/link-rules.ts).
  const handleLink = useCallback(
    (attempt: LinkAttempt) => {
      const refusal = linkRefusal(store.getState().doc, attempt);
      if (refusal) return refusal;
      store.getState().addLink({ from: attempt.from, to: attempt.to, species: attempt.fromSpecies });
      return null;
    },
    [store],
  );
  const handleRemoveLink = useCallback((link: LinkInput) => store.getState().removeLink(link), [store]);
  const handleDrop = useCallback(
    (payload: StepDragPayload, position: StepInput['position']) => store.getState().addStep({ equation: payload.equation, temperature: payload.temperature, ...(payload.species ? { species: payload.species } : {}), position }),
    [store],
  );

  // Palette clicks and the keyboard "Add": the new step goes to the right of the last one added (a route reads left
  // to right), or near the top left of what the canvas shows, in free space; the view follows if it lands outside.
  const handleAdd = (payload: StepDragPayload) => {
    const view = flow.current;
    const box = canvasBox.current?.getBoundingClientRect();
    const steps = store.getState().doc.steps;
    const last = steps.at(-1);
    const topLeft = box && view ? view.screenToFlowPosition({ x: box.left + 40, y: box.top + 40 }) : { x: 0, y: 0 };
    const preferred = last ? { x: last.position.x + (view?.getNode(last.id)?.width ?? NEW_NODE_SIZE.width) + 48, y: last.position.y } : topLeft;
    const at = placeNewStep(steps, (id) => view?.getNode(id) ?? undefined, preferred);
    handleDrop(payload, at);
    const far = box && view ? view.screenToFlowPosition({ x: box.right, y: box.bottom }) : null;
    if (far && (at.x < topLeft.x - 40 || at.y < topLeft.y - 40 || at.x + NEW_NODE_SIZE.width > far.x || at.y + NEW_NODE_SIZE.height > far.y)) {
      requestAnimationFrame(() => requestAnimationFrame(fitView));
    }
  };

  const selectedResult = selectedStepId ? results.get(selectedStepId) : undefined;
  const updateSelected = (patch: Partial<StepInput>) => {
    if (selectedStepId) store.getState().updateStep(selectedStepId, patch);
  };

  return (
    <div className="flex flex-col gap-3">
      <header className="flex flex-wrap items-end justify-between gap-3 border-b border-paper-edge pb-3">
        <div>
          <h1 className="text-xl font-semibold tracking-tight">{name}</h1>
          <p className="text-sm text-ink-soft">
            Target <FormulaText value={target} />
            {canEdit ? null : <span className="ml-2 rounded bg-paper-deep px-1.5 py-0.5 text-xs">read-only</span>}
          </p>
          {review.archived ? null : (
            <div className="mt-1.5 flex flex-wrap items-center gap-2">
              <AlternativesMenu routeId={routeId} />
              <WorkflowBar routeId={routeId} teamId={review.teamId} status={review.status} role={review.role} selfId={review.selfId} stepLabels={stepTitles} />
            </div>
          )}
        </div>
        <div className="flex items-center gap-3">
          {canEdit ? <SaveStatus isEvaluating={isEvaluating} onRetry={() => void saveNow()} /> : <p className="text-xs text-ink-faint">{isEvaluating ? 'evaluating…' : ''}</p>}
          {canEdit ? (
            <div className="hidden gap-1 md:flex">
              <Button variant="secondary" disabled={!canUndo} onClick={() => store.getState().undo()}>
                Undo
              </Button>
              <Button variant="secondary" disabled={!canRedo} onClick={() => store.getState().redo()}>
                Redo
              </Button>
            </div>
          ) : null}
        </div>
      </header>

      <SafetyCaution />
      {isPhone ? <RouteReadOnlyView results={results} stepLabels={stepLabels} units={units} /> : null}

      <div className={`hidden gap-3 md:grid md:grid-cols-[minmax(0,1fr)_18rem] ${canEdit ? 'lg:grid-cols-[13rem_minmax(0,1fr)_20rem]' : 'lg:grid-cols-[minmax(0,1fr)_20rem]'}`}>
        {canEdit ? (
          <div className="h-[16rem] md:col-span-2 lg:col-span-1 lg:h-[34rem]">
            <StepPalette onAdd={handleAdd} />
          </div>
        ) : null}
        <div ref={canvasBox} className="h-[34rem] overflow-hidden rounded-lg border border-paper-edge bg-white">
          <BoardCanvas
            results={results}
            stale={stale}
            energyUnit={units.energyUnit}
            temperatureUnit={units.temperatureUnit}
            isReadOnly={!canEdit}
            reviewMarks={reviewData.marks}
            onSelectStep={handleSelectStep}
            onMoveStep={handleMoveStep}
            onLink={handleLink}
            onRemoveLink={handleRemoveLink}
            onDropStep={handleDrop}
            onInit={(instance) => {
              flow.current = instance;
            }}
          />
        </div>
        <div className="h-[34rem] overflow-y-auto rounded-lg border border-paper-edge bg-white p-3">
          <SidePanel units={units} canEdit={canEdit} evaluation={evaluation} results={results} stale={stale} stepLabels={stepLabels} />
        </div>
      </div>
      <p className="hidden text-xs text-ink-faint md:block">{canEdit ? SHORTCUT_HELP : 'F fits the view · select a step to read its details'}</p>
      {/* Below the board, so warnings appearing never shift the canvas under the pointer. */}
      <RouteWarnings warnings={evaluation?.warnings ?? []} stepLabels={stepTitles} error={error} hasEarlierResult={evaluation !== undefined} />

      <div className="grid gap-3 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <section aria-label="Free-energy ladder" className="rounded-lg border border-paper-edge bg-white p-3">
          <FreeEnergyLadder
            evaluation={evaluation}
            energyUnit={units.energyUnit}
            selectedStepId={selectedStepId}
            onSelectStep={(id) => store.getState().selectStep(id)}
            stepLabels={ladderLabels}
            routeLabels={allLabels}
            exportName={name}
            reviewMarks={reviewData.marks}
          />
        </section>
        <RemediesPanel
          step={selectedResult}
          energyUnit={units.energyUnit}
          temperatureUnit={units.temperatureUnit}
          canEdit={canEdit && !isPhone}
          stepLabels={stepLabels}
          onApplyTemperature={(T_K) => updateSelected({ temperature: temperatureQuantity(T_K) })}
          onApplyConditions={(patch) => updateSelected(patch)}
          onAddCoupledStep={(equation, temperature) => {
            // The coupled reaction takes the step's place (one undoable edit); adding it beside the step would count the step twice.
            if (selectedStepId) store.getState().updateStep(selectedStepId, { equation, temperature });
          }}
        />
      </div>
      <ReviewSection routeId={routeId} selfId={review.selfId} role={review.role} canEdit={canEdit} unit={units.energyUnit} stepLabels={stepTitles} data={reviewData} />
      {canEdit ? <ConflictDialog routeId={routeId} /> : null}
    </div>
  );
}
