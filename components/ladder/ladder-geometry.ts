// Pure geometry of the free-energy ladder: the staircase in display units, its y-domain, and the pixel
// layout (bands, risers, treads, the dashed standard ladder, ticks). No React, no DOM, so it is unit-tested.
import { scaleBand, scaleLinear } from 'd3-scale';
import type { RouteStepResult, StepClass } from '@/lib/thermo/route';
import { CAUSE_LABEL, causeOf } from '@/lib/route-editor/step-errors';
import { stepEstimates } from '@/lib/thermo/route/step-estimates';
import { energyFromKJ, type EnergyUnit } from './energy-format';

export type LadderStepInput = Pick<RouteStepResult, 'id' | 'class' | 'cumulative_kJ' | 'cumulative0_kJ' | 'extent_mol'> &
  Partial<Pick<RouteStepResult, 'result' | 'signUncertain' | 'error'>>;

/** Why a step has no riser: the engine could not evaluate it, or it has no extent and is left out of the totals. */
export type GapReason = 'error' | 'not-counted';

export interface LadderStep {
  id: string;
  /** 1-based position along x; slot 0 is the start point */
  slot: number;
  cls: StepClass;
  gap: GapReason | null;
  /** cumulative ΔG at conditions before and after this step, in the display unit */
  from: number;
  to: number;
  /** the same for the standard ladder (ΔG°) */
  from0: number;
  to0: number;
  /** ΔG uses at least one estimated species (a group-contribution value, not a measured one) */
  estimated: boolean;
  /** |ΔG| ≤ σ per mol of reaction: the data cannot decide the sign */
  signUncertain: boolean;
  /** σ(ΔrG°) per mol of reaction in kJ (the engine's unit); null when none is known */
  sigma_kJ: number | null;
  /** for a step that could not be evaluated, its cause in words ("check temperature", "unknown species") */
  problemLabel?: string;
}

export interface LadderModel {
  steps: LadderStep[];
  /** some step uses estimated values: the legend explains the mark */
  hasEstimates: boolean;
  /** where each ladder ends, in the display unit */
  end: number;
  end0: number;
  /** y-domain in the display unit, before nicing: always holds 0 and every point of both ladders */
  domain: [number, number];
}

export const START_KEY = '__start';
const DOMAIN_PAD = 0.08;

// Pixel values to 0.01 px: stable SVG text and tests, invisible on screen.
const round = (v: number): number => Math.round(v * 100) / 100;

/** Steps in `order`; a step the response does not hold is drawn as an error gap. `slots` numbers them as the board does. */
export function buildLadder(order: readonly string[], steps: readonly LadderStepInput[], unit: EnergyUnit, slots?: ReadonlyMap<string, number>): LadderModel {
  const byId = new Map(steps.map((s) => [s.id, s]));
  let level = 0;
  let level0 = 0;
  const out: LadderStep[] = order.map((id, i) => {
    const s = byId.get(id);
    const gap: GapReason | null = !s || s.class === 'error' ? 'error' : s.extent_mol === null ? 'not-counted' : null;
    const from = level;
    const from0 = level0;
    // A gap keeps the level: the engine leaves such steps out of the running sums.
    if (s && gap === null) {
      level = energyFromKJ(s.cumulative_kJ, unit);
      level0 = energyFromKJ(s.cumulative0_kJ, unit);
    }
    const sigma = s?.result?.uncertainty.deltaG0_kJ ?? null;
    return {
      id, slot: slots?.get(id) ?? i + 1, cls: s?.class ?? 'error', gap, from, to: level, from0, to0: level0,
      estimated: stepEstimates(s?.result) !== null,
      signUncertain: s?.signUncertain === true && gap !== 'error',
      sigma_kJ: sigma !== null && Number.isFinite(sigma) ? sigma : null,
      ...(gap === 'error' ? { problemLabel: s?.error ? CAUSE_LABEL[causeOf(s.error)] : 'not evaluated' } : {}),
    };
  });
  return { steps: out, hasEstimates: out.some((s) => s.estimated), end: level, end0: level0, domain: ladderDomain(out) };
}

export function ladderDomain(steps: readonly LadderStep[]): [number, number] {
  let lo = 0;
  let hi = 0;
  for (const s of steps) {
    for (const v of [s.from, s.to, s.from0, s.to0]) {
      if (!Number.isFinite(v)) continue;
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
  }
  // A flat ladder still needs a visible band around zero; otherwise pad both ends so no point sits on the frame.
  if (hi - lo === 0) return [lo - 1, hi + 1];
  const pad = (hi - lo) * DOMAIN_PAD;
  return [lo - pad, hi + pad];
}

/** Nice round tick values covering the domain (d3's 1-2-5 steps). */
export function niceTicks(domain: readonly [number, number], count: number): number[] {
  return scaleLinear().domain(domain).nice(count).ticks(count);
}

export type LegendKey = 'conditions' | 'standard' | 'downhill' | 'marginal' | 'uphill' | 'error' | 'estimated';

export const LEGEND_ITEMS: readonly { key: LegendKey; label: string }[] = [
  { key: 'conditions', label: 'ΔG at conditions' },
  { key: 'standard', label: 'ΔG° standard state' },
  { key: 'downhill', label: '↓ downhill' },
  { key: 'marginal', label: '≈ marginal' },
  { key: 'uphill', label: '↑ uphill' },
  { key: 'error', label: 'not evaluated' },
  { key: 'estimated', label: '◌ estimated values' },
];

export interface LegendItemLayout {
  key: LegendKey;
  label: string;
  x: number;
  y: number;
}

const LEGEND_SWATCH = 18;
const LEGEND_ROW = 18;

/**
 * Flows the legend into rows that fit the width (text width estimated per glyph; SVG text does not wrap). The
 * estimated-values entry shows only when some step has the mark.
 */
export function layoutLegend(width: number, left: number, pxPerChar = 5.6, withEstimates = false): { items: LegendItemLayout[]; rows: number } {
  const items: LegendItemLayout[] = [];
  let x = left;
  let row = 0;
  for (const item of LEGEND_ITEMS) {
    if (item.key === 'estimated' && !withEstimates) continue;
    const w = LEGEND_SWATCH + 6 + item.label.length * pxPerChar + 10;
    if (x > left && x + w > width) {
      row += 1;
      x = left;
    }
    items.push({ ...item, x: round(x), y: 12 + row * LEGEND_ROW });
    x += w;
  }
  return { items, rows: row + 1 };
}

export interface LayoutOptions {
  width: number;
  height: number;
  margin?: { top: number; right: number; bottom: number; left: number };
  /** lines of notes under the step labels (estimated values, a sign-uncertain total), exported with the chart */
  noteLines?: number;
}

export interface RiserLayout {
  step: LadderStep;
  /** the band of this step */
  bandX: number;
  bandWidth: number;
  /** riser rectangle */
  x: number;
  y: number;
  w: number;
  h: number;
  /** tread at the new level, from the riser to the end of the band */
  treadX1: number;
  treadX2: number;
  treadY: number;
  /** anchor for the ΔG text and for the tooltip */
  labelX: number;
  labelY: number;
  /** y of the level a gap marker sits on */
  levelY: number;
  goesUp: boolean;
}

export interface LadderLayout {
  width: number;
  height: number;
  plot: { left: number; right: number; top: number; bottom: number };
  yDomain: [number, number];
  ticks: { value: number; y: number }[];
  zeroY: number;
  start: { x1: number; x2: number; y: number; labelX: number };
  bandWidth: number;
  risers: RiserLayout[];
  /** SVG path of the standard (ΔG°) ladder, dashed; broken at gaps */
  standardPath: string;
  /** x of the centre of each band, for the step labels */
  labelXs: { id: string; x: number }[];
  legend: LegendItemLayout[];
  /** baseline of each note line, left-aligned at plot.left */
  noteYs: number[];
}

export const DEFAULT_MARGIN = { top: 14, right: 16, bottom: 44, left: 68 };
const MIN_RISER_PX = 2;
const NOTE_LINE_PX = 15;

export function layoutLadder(model: LadderModel, opts: LayoutOptions): LadderLayout {
  const base = opts.margin ?? DEFAULT_MARGIN;
  const width = Math.max(opts.width, base.left + base.right + 40);
  const legend = layoutLegend(width - base.right, 8, undefined, model.hasEstimates);
  const notes = Math.max(0, opts.noteLines ?? 0);
  // The legend sits in the top margin, so the plot starts below its last row; notes add to the bottom margin.
  const m = { ...base, top: base.top + legend.rows * LEGEND_ROW, bottom: base.bottom + notes * NOTE_LINE_PX };
  const height = Math.max(opts.height, m.top + m.bottom + 40);
  const plot = { left: m.left, right: width - m.right, top: m.top, bottom: height - m.bottom };
  const tickCount = Math.max(2, Math.floor((plot.bottom - plot.top) / 44));
  const y = scaleLinear().domain(model.domain).nice(tickCount).range([plot.bottom, plot.top]);
  const x = scaleBand<string>().domain([START_KEY, ...model.steps.map((s) => s.id)]).range([plot.left, plot.right]).padding(0);
  const bw = x.bandwidth();
  const riserW = Math.min(22, Math.max(6, bw * 0.2));
  const band = (key: string): number => x(key) ?? plot.left;

  const risers: RiserLayout[] = model.steps.map((step) => {
    const bandX = band(step.id);
    const yFrom = y(step.from);
    const yTo = y(step.to);
    const dy = Math.abs(yFrom - yTo);
    // A riser of ~0 kJ still gets a sliver to click and to focus.
    const h = Math.max(dy, MIN_RISER_PX);
    const top = Math.min(yFrom, yTo) - (h - dy) / 2;
    return {
      step,
      bandX: round(bandX),
      bandWidth: round(bw),
      x: round(bandX),
      y: round(top),
      w: round(riserW),
      h: round(h),
      treadX1: round(bandX + riserW),
      treadX2: round(bandX + bw),
      treadY: round(yTo),
      labelX: round(bandX + riserW + 6),
      labelY: round(top + h / 2),
      levelY: round(yFrom),
      goesUp: step.to > step.from,
    };
  });

  const startX = band(START_KEY);
  const parts = [`M${round(startX + bw / 2)},${round(y(0))}H${round(startX + bw)}`];
  let open = true;
  for (const r of risers) {
    if (r.step.gap) {
      open = false;
      continue;
    }
    // The dashed riser sits just right of the solid one, so both stay readable.
    const dx = round(r.bandX + r.w + 2);
    if (!open) parts.push(`M${dx},${round(y(r.step.from0))}`);
    parts.push(`${open ? 'H' + dx : ''}V${round(y(r.step.to0))}H${round(r.bandX + r.bandWidth)}`);
    open = true;
  }

  return {
    width,
    height,
    plot,
    yDomain: y.domain() as [number, number],
    ticks: y.ticks(tickCount).map((value) => ({ value, y: round(y(value)) })),
    zeroY: round(y(0)),
    start: { x1: round(startX + bw / 2), x2: round(startX + bw), y: round(y(0)), labelX: round(startX + bw / 2) },
    bandWidth: round(bw),
    risers,
    standardPath: parts.join(''),
    labelXs: model.steps.map((s) => ({ id: s.id, x: round(band(s.id) + bw / 2) })),
    legend: legend.items,
    // Below the step labels and the selection marker (plot.bottom + 28).
    noteYs: Array.from({ length: notes }, (_, i) => round(plot.bottom + 40 + i * NOTE_LINE_PX)),
  };
}

/** Shortens a label to fit a band, by a rough average glyph width. */
export function fitLabel(text: string, bandWidth: number, pxPerChar = 6.5): string {
  const max = Math.max(1, Math.floor((bandWidth - 6) / pxPerChar));
  return text.length <= max ? text : `${text.slice(0, Math.max(1, max - 1))}…`;
}

/** Decimals that tell neighbouring ticks apart: 0 for steps of 1 or more, up to 2 for finer ones. */
export function tickDecimals(ticks: readonly number[]): number {
  if (ticks.length < 2) return 0;
  const step = Math.abs(ticks[1]! - ticks[0]!);
  if (!(step > 0)) return 0;
  return Math.min(2, Math.max(0, -Math.floor(Math.log10(step) + 1e-9)));
}
