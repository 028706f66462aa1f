'use client';

import { scaleLinear } from 'd3-scale';
import { useId } from 'react';
import type { LadderStep, RouteLadder } from '@/lib/compare/compare-types';
import { energyFromKJ, energyUnitLabel, formatEnergy, type EnergyUnit } from '../ladder/energy-format';
import { withTrueMinus } from '@/lib/format/numbers';
import { LadderPatterns } from '../ladder/ladder-frame';
import { CLASS_STYLES, LADDER_COLOURS as C } from '../ladder/ladder-palette';
import { ESTIMATE_WORD, stepSignUncertainText } from '../ladder/ladder-uncertainty';

export type LadderBasis = 'conditions' | 'standard';

const W = 360;
const H = 240;
const M = { top: 16, right: 10, bottom: 26, left: 48 };

function rise(step: LadderStep, basis: LadderBasis): number | null {
  return basis === 'conditions' ? step.deltaG_kJ : step.deltaG0_kJ;
}

/** The y extent every compared ladder shares (kJ per mol of target), with zero always in view. */
export function sharedDomain(ladders: ReadonlyArray<RouteLadder | null>, basis: LadderBasis): [number, number] {
  let lo = 0;
  let hi = 0;
  for (const ladder of ladders) {
    for (const s of ladder?.steps ?? []) {
      const top = basis === 'conditions' ? s.cumulative_kJ : s.cumulative0_kJ;
      lo = Math.min(lo, top);
      hi = Math.max(hi, top);
    }
  }
  const pad = Math.max(5, (hi - lo) * 0.08);
  return [lo - pad, hi + pad];
}

// One route's staircase on the shared scale: each step a riser from the running total, class shown by
// colour, glyph and (uphill) hatching; steps shared with another compared route get a brass outline; steps on
// estimated values a dotted frame, as on the route board, and the words in their title.
export function CompareLadder({
  name,
  ladder,
  domain_kJ,
  basis,
  unit,
  sharedStepIds,
}: {
  name: string;
  ladder: RouteLadder;
  domain_kJ: [number, number];
  basis: LadderBasis;
  unit: EnergyUnit;
  sharedStepIds: ReadonlySet<string>;
}) {
  const prefix = `cmp-${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const byId = new Map(ladder.steps.map((s) => [s.id, s]));
  const steps = ladder.order.map((id) => byId.get(id)).filter((s): s is LadderStep => s !== undefined);
  const y = scaleLinear()
    .domain(domain_kJ.map((v) => energyFromKJ(v, unit)))
    .range([H - M.bottom, M.top])
    .nice();
  const band = (W - M.left - M.right) / Math.max(1, steps.length);
  const ticks = y.ticks(5);
  let running = 0;
  const title = `${name}: ${basis === 'conditions' ? 'ΔG at conditions' : 'standard ΔG°'}, ${energyUnitLabel(unit)} per mol of target`;
  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full" role="img" aria-label={title}>
      <title>{title}</title>
      <LadderPatterns prefix={prefix} />
      {ticks.map((t) => (
        <g key={t}>
          <line x1={M.left} x2={W - M.right} y1={y(t)} y2={y(t)} stroke={t === 0 ? C.inkSoft : C.paperEdge} strokeWidth={t === 0 ? 1.25 : 0.75} />
          <text x={M.left - 4} y={y(t)} textAnchor="end" dominantBaseline="middle" fontSize={10} fill={C.inkSoft}>
            {t > 0 ? `+${t}` : withTrueMinus(String(t))}
          </text>
        </g>
      ))}
      {steps.map((s, i) => {
        const from = running;
        const delta = rise(s, basis);
        if (delta !== null) running += delta;
        const x = M.left + i * band;
        const style = CLASS_STYLES[basis === 'conditions' ? s.class : delta === null ? 'error' : delta > 0 ? 'uphill' : 'downhill'];
        const y0 = y(energyFromKJ(from, unit));
        const y1 = y(energyFromKJ(running, unit));
        const shared = sharedStepIds.has(s.id);
        const words = [shared ? 'shared with another route' : '', s.estimated ? `uses ${ESTIMATE_WORD} values` : '', s.signUncertain ? stepSignUncertainText(null, unit) : ''].filter(Boolean);
        const label = `${i + 1}. ${s.equation || 'blank step'}: ${delta === null ? 'not evaluated' : formatEnergy(delta, unit)} (${style.label})${words.length ? `, ${words.join(', ')}` : ''}`;
        return (
          <g key={s.id} data-step-id={s.id} data-shared={shared || undefined} data-estimated={s.estimated || undefined}>
            <title>{label}</title>
            {shared ? <rect x={x + 1} y={M.top} width={band - 2} height={H - M.top - M.bottom} fill={C.brassLight} opacity={0.55} /> : null}
            {delta === null ? (
              <text x={x + band / 2} y={y0} textAnchor="middle" dominantBaseline="middle" fontSize={11} fill={C.inkFaint}>
                !
              </text>
            ) : (
              <>
                <rect x={x + band * 0.3} y={Math.min(y0, y1)} width={band * 0.4} height={Math.max(1, Math.abs(y1 - y0))} fill={style.fill} stroke={style.stroke} strokeWidth={shared ? 2 : 1} />
                {style.pattern ? <rect x={x + band * 0.3} y={Math.min(y0, y1)} width={band * 0.4} height={Math.max(1, Math.abs(y1 - y0))} fill={`url(#${prefix}-${style.pattern})`} /> : null}
                {s.estimated ? (
                  <rect x={x + band * 0.3 - 2.5} y={Math.min(y0, y1) - 2.5} width={band * 0.4 + 5} height={Math.max(1, Math.abs(y1 - y0)) + 5} fill="none" stroke={C.ink} strokeWidth={1} strokeDasharray="1 2.5" strokeLinecap="round" />
                ) : null}
                <line x1={x + band * 0.3} x2={x + band} y1={y1} y2={y1} stroke={C.ink} strokeWidth={1.5} />
                {band >= 22 ? (
                  <text x={x + band / 2} y={Math.min(y0, y1) - 4} textAnchor="middle" fontSize={10} fontWeight={700} fill={style.stroke}>
                    {style.glyph}
                  </text>
                ) : null}
              </>
            )}
            {band >= 18 ? (
              <text x={x + band / 2} y={H - M.bottom + 14} textAnchor="middle" fontSize={10} fill={shared ? C.brassDeep : C.inkSoft} fontWeight={shared ? 700 : 400}>
                {i + 1}
              </text>
            ) : null}
          </g>
        );
      })}
      <text x={12} y={H / 2} transform={`rotate(-90 12 ${H / 2})`} textAnchor="middle" fontSize={10} fill={C.inkSoft}>
        cumulative {basis === 'conditions' ? 'ΔG' : 'ΔG°'} / {energyUnitLabel(unit)}
      </text>
    </svg>
  );
}
