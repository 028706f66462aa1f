'use client';
// One step on the ladder: a riser (class colour, glyph and, for uphill, hatching) with its tread, or a
// gap marker when the step has no riser. A step on estimated values gets a dotted frame and "◌ est." as well. Each is a focusable button; the parent owns selection and tooltips.
import type { FocusEvent, KeyboardEvent } from 'react';
import type { EnergyUnit } from './energy-format';
import { riserText, stepAriaLabel } from './ladder-describe';
import type { RiserLayout } from './ladder-geometry';
import { CLASS_STYLES, LADDER_COLOURS as C } from './ladder-palette';
import { ESTIMATE_GLYPH, ESTIMATE_WORD } from './ladder-uncertainty';
import { compactReviewMarkText, reviewMarkText, type StepReviewMarks } from '../review/review-marks';

export interface StepMarkHandlers {
  onSelect: (id: string) => void;
  onKeyDown: (event: KeyboardEvent<SVGGElement>, id: string) => void;
  onFocusChange: (id: string | null, isKeyboard: boolean) => void;
  onHover: (id: string | null) => void;
  registerRef: (id: string, el: SVGGElement | null) => void;
}

interface StepMarkProps extends StepMarkHandlers {
  layout: RiserLayout;
  label: string;
  reviewMarks?: StepReviewMarks;
  unit: EnergyUnit;
  patternPrefix: string;
  plotBottom: number;
  isSelected: boolean;
  hasFocusRing: boolean;
  tooltipId: string | undefined;
}

const HIT_PAD = 8;
const GLYPH_PX = 6.6;
/** the dotted frame of an estimated step stands this far outside its riser */
const FRAME_GAP = 3;

/** The estimate mark: a dotted frame around the riser, and the glyph with a word under the ΔG text. */
function EstimateMark({ r, room }: { r: RiserLayout; room: number }) {
  const words = `${ESTIMATE_GLYPH} est.`;
  return (
    <g data-testid="ladder-estimate-mark">
      <rect
        x={r.x - FRAME_GAP}
        y={r.y - FRAME_GAP}
        width={r.w + 2 * FRAME_GAP}
        height={r.h + 2 * FRAME_GAP}
        fill="none"
        stroke={C.ink}
        strokeWidth={1.25}
        strokeDasharray="1 2.5"
        strokeLinecap="round"
        pointerEvents="none"
      />
      <text x={r.labelX} y={r.labelY + 13} dominantBaseline="middle" fontSize={10} fontWeight={600} fill={C.inkSoft} stroke={C.paper} strokeWidth={3} paintOrder="stroke">
        <title>{`${ESTIMATE_WORD} values: group contribution, not measured`}</title>
        {words.length * GLYPH_PX <= room ? words : ESTIMATE_GLYPH}
      </text>
    </g>
  );
}

export function LadderStepMark(props: StepMarkProps) {
  const { layout: r, label, unit, isSelected, hasFocusRing, tooltipId, plotBottom } = props;
  const id = r.step.id;
  const style = CLASS_STYLES[r.step.cls];
  const text = riserText(r.step);
  const review = reviewMarkText(props.reviewMarks);
  const reviewShort = compactReviewMarkText(props.reviewMarks);

  const handleFocus = (e: FocusEvent<SVGGElement>): void => {
    // Only keyboard focus draws the ring; a click already shows where it landed.
    props.onFocusChange(id, e.currentTarget.matches(':focus-visible'));
  };

  const common = {
    ref: (el: SVGGElement | null) => props.registerRef(id, el),
    role: 'button',
    tabIndex: 0,
    'aria-label': `${stepAriaLabel(r.step, label, unit, isSelected)}${review ? `; ${review}` : ''}`,
    'aria-pressed': isSelected,
    'aria-describedby': tooltipId,
    'data-step-id': id,
    style: { outline: 'none', cursor: 'pointer' },
    onClick: () => props.onSelect(id),
    onKeyDown: (e: KeyboardEvent<SVGGElement>) => props.onKeyDown(e, id),
    onFocus: handleFocus,
    onBlur: () => props.onFocusChange(null, false),
    onMouseEnter: () => props.onHover(id),
    onMouseLeave: () => props.onHover(null),
  };

  if (r.step.gap) {
    const cx = r.bandX + r.bandWidth / 2;
    const cy = r.levelY;
    const below = cy + 24 <= plotBottom - 2;
    const textY = below ? cy + 22 : cy - 14;
    const fits = text.length * GLYPH_PX <= r.bandWidth - 4;
    const isError = r.step.gap === 'error';
    return (
      <g {...common}>
        <rect data-export-skip x={r.bandX} y={cy - 14} width={r.bandWidth} height={38} fill="transparent" />
        <line x1={r.bandX} x2={r.bandX + r.bandWidth} y1={cy} y2={cy} stroke={C.inkFaint} strokeWidth={1} strokeDasharray="2 4" />
        <circle
          cx={cx}
          cy={cy}
          r={9}
          fill={isError ? C.paperDeep : C.paper}
          stroke={isSelected ? C.ink : C.inkFaint}
          strokeWidth={isSelected ? 2.5 : 1.25}
          strokeDasharray={isError ? undefined : '3 2'}
        />
        <text x={cx} y={cy} textAnchor="middle" dominantBaseline="central" fontSize={12} fontWeight={700} fill={C.inkSoft}>
          {isError ? '!' : '–'}
        </text>
        {fits ? (
          <text x={cx} y={textY} textAnchor="middle" dominantBaseline="middle" fontSize={10} fill={C.inkSoft}>
            {isError ? (r.step.problemLabel ?? 'not evaluated') : text}
          </text>
        ) : null}
        {hasFocusRing ? (
          <rect data-export-skip x={cx - 14} y={cy - 14} width={28} height={28} rx={4} fill="none" stroke={C.brass} strokeWidth={2} />
        ) : null}
      </g>
    );
  }

  const hitTop = Math.min(r.y, r.treadY) - HIT_PAD;
  const hitBottom = Math.max(r.y + r.h, r.treadY) + HIT_PAD;
  const room = r.treadX2 - r.labelX;
  // Narrow bands keep the glyph only; the tooltip and the aria-label carry the number.
  const shown = text.length * GLYPH_PX <= room ? text : style.glyph;
  return (
    <g {...common}>
      <rect data-export-skip x={r.bandX} y={hitTop} width={r.bandWidth} height={hitBottom - hitTop} fill="transparent" />
      <rect x={r.x} y={r.y} width={r.w} height={r.h} fill={style.fill} stroke={isSelected ? C.ink : style.stroke} strokeWidth={isSelected ? 2.5 : 1.25} />
      {style.pattern ? <rect x={r.x} y={r.y} width={r.w} height={r.h} fill={`url(#${props.patternPrefix}-${style.pattern})`} pointerEvents="none" /> : null}
      <line x1={r.treadX1} x2={r.treadX2} y1={r.treadY} y2={r.treadY} stroke={C.ink} strokeWidth={isSelected ? 3 : 2} strokeLinecap="square" />
      <text
        x={r.labelX}
        y={r.labelY}
        dominantBaseline="middle"
        fontSize={11}
        fontWeight={r.step.cls === 'uphill' ? 700 : 600}
        fill={style.stroke}
        stroke={C.paper}
        strokeWidth={3}
        paintOrder="stroke"
      >
        {shown}
      </text>
      {r.step.estimated ? <EstimateMark r={r} room={room} /> : null}
      {reviewShort ? (
        <text x={r.bandX + r.bandWidth / 2} y={Math.max(10, hitTop - 2)} textAnchor="middle" fontSize={10} fontWeight={700} fill={C.brassDeep} data-testid="ladder-review-marks">
          {reviewShort}
        </text>
      ) : null}
      {hasFocusRing ? (
        <rect
          data-export-skip
          x={r.bandX + 1}
          y={hitTop}
          width={r.bandWidth - 2}
          height={hitBottom - hitTop}
          rx={4}
          fill="none"
          stroke={C.brass}
          strokeWidth={2}
        />
      ) : null}
    </g>
  );
}
