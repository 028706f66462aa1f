'use client';
// The route's free-energy ladder: one riser per step from the running total before it to the one after,
// at conditions (solid) beside the standard state (dashed). Props in, callbacks out; no data fetching.
import { useCallback, useId, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import type { RouteEvaluateResponse, RouteStepResult } from '@/lib/thermo/route';
import type { StepLabel } from '@/lib/route-editor/step-label';
import { totalsWaitReason } from '@/lib/route-editor/totals-wait';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { formatEnergy, type EnergyUnit } from './energy-format';
import { axisTitle, estimatedStepsNote, ladderSummary, stepLabelOf } from './ladder-describe';
import { ladderStepsCsv } from './ladder-csv';
import { csvBlob, downloadBlob, exportFileName, serializeLadderSvg, svgBlob, svgToPngBlob } from './ladder-export';
import { LadderAxes, LadderLegend, LadderNotes, LadderPatterns, LadderStepLabels, LadderZeroAndStart } from './ladder-frame';
import { buildLadder, layoutLadder } from './ladder-geometry';
import { ladderInRouteOrder } from './ladder-order';
import { LADDER_COLOURS as C } from './ladder-palette';
import { LadderStepMark } from './ladder-step-mark';
import { LadderTooltip } from './ladder-tooltip';
import { totalSigmaText } from './ladder-uncertainty';
import { useElementWidth } from './use-element-width';
import type { ReviewMarksByStep } from '../review/review-marks';

export interface FreeEnergyLadderProps {
  evaluation: RouteEvaluateResponse | null | undefined;
  energyUnit: EnergyUnit;
  selectedStepId: string | null;
  onSelectStep: (stepId: string) => void;
  stepLabels?: Record<string, string>;
  /** the draft's step labels: risers follow its route order and numbers, and messages name steps by them */
  routeLabels?: ReadonlyMap<string, StepLabel>;
  /** the basis of every energy in the response; the engine scales to the route's target amount */
  basisLabel?: string;
  /** file name stem for the exports */
  exportName?: string;
  height?: number;
  /** open flags and unresolved comments per step, written above the risers */
  reviewMarks?: ReviewMarksByStep;
}

const FALLBACK_WIDTH = 720;

export function FreeEnergyLadder({
  evaluation,
  energyUnit,
  selectedStepId,
  onSelectStep,
  stepLabels,
  routeLabels,
  basisLabel = 'per mol of target',
  exportName = 'free-energy-ladder',
  height = 340,
  reviewMarks,
}: FreeEnergyLadderProps) {
  const [containerRef, width] = useElementWidth<HTMLDivElement>(FALLBACK_WIDTH);
  const svgRef = useRef<SVGSVGElement | null>(null);
  const markRefs = useRef(new Map<string, SVGGElement>());
  const [hoverId, setHoverId] = useState<string | null>(null);
  const [focus, setFocus] = useState<{ id: string; isKeyboard: boolean } | null>(null);
  const [isTipDismissed, setTipDismissed] = useState(false);
  const [exportError, setExportError] = useState<string | null>(null);
  const prefix = `ladder-${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const tooltipId = `${prefix}-tip`;

  // The draft's route order and numbers, not the evaluation's: they agree with the nodes while an answer is on its way.
  const routeNumbers = useMemo(() => (routeLabels ? new Map([...routeLabels].map(([id, l]) => [id, l.number])) : undefined), [routeLabels]);
  const drawn = useMemo(() => ladderInRouteOrder(evaluation, routeNumbers), [evaluation, routeNumbers]);
  const order = drawn.order;
  const byId = useMemo(() => new Map<string, RouteStepResult>(drawn.steps.map((s) => [s.id, s])), [drawn]);
  const model = useMemo(() => buildLadder(drawn.order, drawn.steps, energyUnit, drawn.slots), [drawn, energyUnit]);
  const labelOf = useCallback((id: string) => stepLabelOf(id, stepLabels), [stepLabels]);
  const totalSigma = totalSigmaText(evaluation?.overall, energyUnit, basisLabel);
  // Drawn into the chart (and so into its exports) as well as said near the total and in the <desc>.
  const notes = useMemo(() => {
    const out: string[] = [];
    const estimated = estimatedStepsNote(model.steps, labelOf);
    if (estimated) out.push(estimated);
    if (evaluation?.overall.overallSignUncertain && totalSigma) out.push(`Route total: ${totalSigma}`);
    return out;
  }, [model, labelOf, evaluation, totalSigma]);
  const layout = useMemo(() => layoutLadder(model, { width, height, noteLines: notes.length }), [model, width, height, notes.length]);

  const activeId = isTipDismissed ? null : (hoverId ?? focus?.id ?? null);
  const activeRiser = activeId ? layout.risers.find((r) => r.step.id === activeId) : undefined;
  const selectedRiser = selectedStepId ? layout.risers.find((r) => r.step.id === selectedStepId) : undefined;

  const registerRef = useCallback((id: string, el: SVGGElement | null) => {
    if (el) markRefs.current.set(id, el);
    else markRefs.current.delete(id);
  }, []);

  const handleKeyDown = (event: KeyboardEvent<SVGGElement>, id: string): void => {
    const i = order.indexOf(id);
    const moveTo = (j: number): void => {
      const next = order[Math.max(0, Math.min(order.length - 1, j))];
      if (next) markRefs.current.get(next)?.focus();
    };
    if (event.key === 'Enter' || event.key === ' ') {
      event.preventDefault();
      onSelectStep(id);
    } else if (event.key === 'ArrowRight' || event.key === 'ArrowDown') {
      event.preventDefault();
      moveTo(i + 1);
    } else if (event.key === 'ArrowLeft' || event.key === 'ArrowUp') {
      event.preventDefault();
      moveTo(i - 1);
    } else if (event.key === 'Home' || event.key === 'End') {
      event.preventDefault();
      moveTo(event.key === 'Home' ? 0 : order.length - 1);
    } else if (event.key === 'Escape') {
      setTipDismissed(true);
    }
  };

  const handleFocusChange = useCallback((id: string | null, isKeyboard: boolean) => {
    setTipDismissed(false);
    setFocus(id === null ? null : { id, isKeyboard });
  }, []);
  const handleHover = useCallback((id: string | null) => {
    setTipDismissed(false);
    setHoverId(id);
  }, []);

  const exportSvgText = (): string | null => (svgRef.current ? serializeLadderSvg(svgRef.current, layout.width, layout.height) : null);
  const handleExportSvg = (): void => {
    const text = exportSvgText();
    if (!text) return;
    setExportError(null);
    downloadBlob(svgBlob(text), exportFileName(exportName, 'svg'));
  };
  const handleExportPng = async (): Promise<void> => {
    const text = exportSvgText();
    if (!text) return;
    setExportError(null);
    try {
      downloadBlob(await svgToPngBlob(text, layout.width, layout.height, 2), exportFileName(exportName, 'png'));
    } catch (err) {
      setExportError(err instanceof Error ? err.message : 'The PNG could not be made');
    }
  };

  if (!evaluation || order.length === 0) {
    return (
      <EmptyState title="Add steps to see the ladder">
        Each step becomes a riser from the running total of ΔG before it to the total after it, so uphill steps stand out at a glance.
      </EmptyState>
    );
  }

  const title = axisTitle(energyUnit, basisLabel);
  const withheldReason = evaluation.totalsWithheld ? totalsWaitReason(evaluation.totalsWithheld, routeLabels ?? new Map()) : undefined;
  const csvOptions = { slots: drawn.slots, withheldReason };
  return (
    <figure className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        {evaluation.totalsWithheld ? (
          // Each step has its own figures on the board; the route's sums wait until a step makes the target.
          <figcaption className="text-sm text-ink-soft" data-testid="ladder-totals-withheld">
            <span className="font-semibold text-ink">Route totals wait for a complete route:</span> {withheldReason}
          </figcaption>
        ) : (
          <figcaption className="text-sm text-ink-soft">
            Route ΔG <span className="font-semibold text-ink">{formatEnergy(evaluation.overall.deltaG_kJ, energyUnit)}</span>
            <span className="mx-1 text-ink-faint">·</span>
            standard ΔG° <span className="font-semibold text-ink">{formatEnergy(evaluation.overall.deltaG0_kJ, energyUnit)}</span>
            <span className="ml-1 text-ink-faint">({basisLabel})</span>
            {totalSigma ? (
              <span
                className={evaluation.overall.overallSignUncertain ? 'ml-2 rounded border border-ink-soft border-dashed px-1 font-medium text-ink' : 'ml-2 text-ink-faint'}
                data-testid="ladder-total-sigma"
              >
                {evaluation.overall.overallSignUncertain ? `± ${totalSigma}` : totalSigma}
              </span>
            ) : null}
          </figcaption>
        )}
        <div className="flex gap-2">
          <Button variant="secondary" onClick={handleExportSvg}>
            Export SVG
          </Button>
          <Button variant="secondary" onClick={() => void handleExportPng()}>
            Export PNG
          </Button>
          <Button variant="secondary" onClick={() => downloadBlob(csvBlob(ladderStepsCsv({ ...evaluation, order: drawn.order, steps: drawn.steps }, stepLabels, csvOptions)), exportFileName(exportName, 'csv'))} title="Steps with ΔG, σ and where each value came from">
            Export CSV
          </Button>
        </div>
      </div>
      {exportError ? (
        <p role="alert" className="text-xs text-uphill">
          {exportError}
        </p>
      ) : null}
      <div ref={containerRef} className="relative w-full">
        <svg
          ref={svgRef}
          role="group"
          aria-label={`Free-energy ladder, ${title}`}
          aria-describedby={`${prefix}-desc`}
          width={layout.width}
          height={layout.height}
          viewBox={`0 0 ${layout.width} ${layout.height}`}
          className="block max-w-full select-none"
        >
          <desc id={`${prefix}-desc`}>{ladderSummary(model.steps, model.end, model.end0, energyUnit, notes)}</desc>
          <LadderPatterns prefix={prefix} />
          <LadderLegend items={layout.legend} prefix={prefix} />
          {selectedRiser ? (
            <rect
              data-export-skip
              x={selectedRiser.bandX}
              y={layout.plot.top}
              width={selectedRiser.bandWidth}
              height={layout.plot.bottom - layout.plot.top}
              fill={C.brassLight}
              opacity={0.7}
            />
          ) : null}
          <LadderAxes layout={layout} title={title} />
          <LadderZeroAndStart layout={layout} />
          <path d={layout.standardPath} fill="none" stroke={C.inkSoft} strokeWidth={1.5} strokeDasharray="5 4" aria-hidden="true" />
          {layout.risers.map((r) => (
            <LadderStepMark
              key={r.step.id}
              layout={r}
              label={labelOf(r.step.id)}
              reviewMarks={reviewMarks?.[r.step.id]}
              unit={energyUnit}
              patternPrefix={prefix}
              plotBottom={layout.plot.bottom}
              isSelected={r.step.id === selectedStepId}
              hasFocusRing={focus?.id === r.step.id && focus.isKeyboard}
              tooltipId={activeId === r.step.id ? tooltipId : undefined}
              onSelect={onSelectStep}
              onKeyDown={handleKeyDown}
              onFocusChange={handleFocusChange}
              onHover={handleHover}
              registerRef={registerRef}
            />
          ))}
          <LadderStepLabels layout={layout} labelOf={labelOf} selectedId={selectedStepId} />
          <LadderNotes layout={layout} notes={notes} />
        </svg>
        {activeRiser ? (
          <LadderTooltip
            id={tooltipId}
            riser={activeRiser}
            step={byId.get(activeRiser.step.id)}
            label={labelOf(activeRiser.step.id)}
            unit={energyUnit}
            containerWidth={layout.width}
          />
        ) : null}
      </div>
    </figure>
  );
}
