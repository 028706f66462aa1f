import { describe, expect, it } from 'vitest';
import { KJ_PER_KCAL } from '@/components/ladder/energy-format';
import {
  buildLadder,
  fitLabel,
  ladderDomain,
  layoutLadder,
  layoutLegend,
  niceTicks,
  tickDecimals,
  type LadderStepInput,
} from '@/components/ladder/ladder-geometry';

type Row = { id: string; class: LadderStepInput['class']; dG: number | null; dG0: number | null; extent: number | null };

// Running sums built the way the engine builds them: counted steps only.
function steps(rows: Row[]): LadderStepInput[] {
  let c = 0;
  let c0 = 0;
  return rows.map((r) => {
    if (r.dG !== null) c += r.dG;
    if (r.dG0 !== null) c0 += r.dG0;
    return { id: r.id, class: r.class, extent_mol: r.extent, cumulative_kJ: c, cumulative0_kJ: c0 };
  });
}

const ROWS: Row[] = [
  { id: 's1', class: 'uphill', dG: 20, dG0: 35, extent: 1 },
  { id: 's2', class: 'downhill', dG: -50, dG0: -45, extent: 2 },
  { id: 's3', class: 'error', dG: null, dG0: null, extent: null },
  { id: 's4', class: 'marginal', dG: -5, dG0: 3, extent: 1 },
  { id: 's5', class: 'downhill', dG: null, dG0: null, extent: null },
  { id: 's6', class: 'downhill', dG: -30, dG0: -40, extent: 0.5 },
];
const ORDER = ROWS.map((r) => r.id);

describe('buildLadder', () => {
  const model = buildLadder(ORDER, steps(ROWS), 'kJ');

  it('puts every riser from the previous running sum to this one', () => {
    const sums = [20, -30, -30, -35, -35, -65];
    expect(model.steps.map((s) => s.to)).toEqual(sums);
    expect(model.steps.map((s) => s.from)).toEqual([0, ...sums.slice(0, -1)]);
    expect(model.steps.map((s) => s.to0)).toEqual([35, -10, -10, -7, -7, -47]);
    expect(model.end).toBe(-65);
    expect(model.end0).toBe(-47);
  });

  it('keeps the order given, not the order of the steps array', () => {
    const reordered = buildLadder(['s2', 's1'], steps(ROWS.slice(0, 2)).reverse(), 'kJ');
    expect(reordered.steps.map((s) => [s.id, s.slot])).toEqual([
      ['s2', 1],
      ['s1', 2],
    ]);
  });

  it('marks errors and steps without extent as gaps that keep the level', () => {
    expect(model.steps.map((s) => s.gap)).toEqual([null, null, 'error', null, 'not-counted', null]);
    const s3 = model.steps[2]!;
    expect([s3.from, s3.to]).toEqual([-30, -30]);
  });

  it('treats a step missing from the response as an error gap', () => {
    const m = buildLadder(['s1', 'ghost'], steps(ROWS.slice(0, 1)), 'kJ');
    expect(m.steps[1]).toMatchObject({ id: 'ghost', cls: 'error', gap: 'error', from: 20, to: 20 });
  });

  it('converts to kcal by 4.184 exactly', () => {
    const kcal = buildLadder(ORDER, steps(ROWS), 'kcal');
    kcal.steps.forEach((s, i) => {
      expect(s.to).toBeCloseTo(model.steps[i]!.to / KJ_PER_KCAL, 12);
      expect(s.to0).toBeCloseTo(model.steps[i]!.to0 / KJ_PER_KCAL, 12);
    });
    expect(kcal.end).toBeCloseTo(-65 / 4.184, 12);
  });

  it('has a domain that holds 0 and both ladders', () => {
    const [lo, hi] = model.domain;
    const all = model.steps.flatMap((s) => [s.from, s.to, s.from0, s.to0]);
    expect(lo).toBeLessThan(0);
    expect(hi).toBeGreaterThan(0);
    for (const v of all) {
      expect(v).toBeGreaterThanOrEqual(lo);
      expect(v).toBeLessThanOrEqual(hi);
    }
    expect(hi).toBeGreaterThan(35);
    expect(lo).toBeLessThan(-65);
  });
});

describe('ladderDomain', () => {
  it('includes 0 even when the whole ladder is above it', () => {
    const m = buildLadder(['a', 'b'], steps([
      { id: 'a', class: 'uphill', dG: 10, dG0: 10, extent: 1 },
      { id: 'b', class: 'uphill', dG: 5, dG0: 40, extent: 1 },
    ]), 'kJ');
    expect(m.domain[0]).toBeLessThanOrEqual(0);
    expect(m.domain[1]).toBeGreaterThanOrEqual(40);
  });

  it('gives a flat ladder a band around zero', () => {
    expect(ladderDomain([])).toEqual([-1, 1]);
  });
});

describe('layoutLadder', () => {
  const model = buildLadder(ORDER, steps(ROWS), 'kJ');
  const layout = layoutLadder(model, { width: 700, height: 320 });

  it('maps the levels onto the axis: higher ΔG is higher on screen', () => {
    const s1 = layout.risers[0]!;
    expect(s1.goesUp).toBe(true);
    expect(s1.treadY).toBeLessThan(layout.zeroY);
    const s2 = layout.risers[1]!;
    expect(s2.goesUp).toBe(false);
    expect(s2.treadY).toBeGreaterThan(layout.zeroY);
    // The riser spans exactly from the previous tread to its own.
    expect(s2.y).toBeCloseTo(s1.treadY, 1);
    expect(s2.y + s2.h).toBeCloseTo(s2.treadY, 1);
  });

  it('gives every step its own band in order, after the start', () => {
    const xs = layout.risers.map((r) => r.bandX);
    expect(xs[0]).toBeGreaterThan(layout.start.x1);
    xs.slice(1).forEach((x, i) => expect(x).toBeCloseTo(xs[i]! + layout.bandWidth, 1));
    expect(layout.risers.at(-1)!.treadX2).toBeCloseTo(layout.plot.right, 1);
  });

  it('breaks the dashed standard ladder at gaps', () => {
    expect(layout.standardPath.startsWith('M')).toBe(true);
    // One start move plus one restart after each of the two gaps.
    expect(layout.standardPath.match(/M/g)).toHaveLength(3);
  });

  it('has nice ticks inside the plot that include zero', () => {
    expect(layout.ticks.map((t) => t.value)).toContain(0);
    for (const t of layout.ticks) {
      expect(t.y).toBeGreaterThanOrEqual(layout.plot.top - 0.01);
      expect(t.y).toBeLessThanOrEqual(layout.plot.bottom + 0.01);
    }
  });

  it('gives a zero-height riser a visible sliver', () => {
    const flat = buildLadder(['a'], steps([{ id: 'a', class: 'marginal', dG: 0, dG0: 0, extent: 1 }]), 'kJ');
    expect(layoutLadder(flat, { width: 400, height: 300 }).risers[0]!.h).toBe(2);
  });

  it('makes room for note lines under the step labels, one below the other', () => {
    const plain = layoutLadder(model, { width: 720, height: 340 });
    const noted = layoutLadder(model, { width: 720, height: 340, noteLines: 2 });
    expect(plain.noteYs).toEqual([]);
    expect(plain.plot.bottom - noted.plot.bottom).toBe(30);
    expect(noted.noteYs).toEqual([noted.plot.bottom + 40, noted.plot.bottom + 55]);
    expect(noted.noteYs[1]!).toBeLessThan(noted.height);
  });

  it('lists the estimated-values entry in the legend only when asked', () => {
    expect(layoutLegend(1200, 8).items.map((i) => i.key)).not.toContain('estimated');
    expect(layoutLegend(1200, 8, undefined, true).items.map((i) => i.key)).toContain('estimated');
  });

  it('wraps the legend into more rows on a narrow chart and moves the plot down', () => {
    expect(layoutLegend(1200, 8).rows).toBe(1);
    expect(layoutLegend(320, 8).rows).toBeGreaterThan(1);
    const narrow = layoutLadder(model, { width: 320, height: 320 });
    expect(narrow.plot.top).toBeGreaterThan(layout.plot.top);
  });
});

describe('ticks and labels', () => {
  it('covers the domain with round 1-2-5 steps', () => {
    const ticks = niceTicks([-63, 21], 5);
    expect(ticks).toEqual([-80, -60, -40, -20, 0, 20, 40]);
    expect(niceTicks([-0.3, 0.8], 5)).toEqual([-0.4, -0.2, 0, 0.2, 0.4, 0.6, 0.8]);
  });

  it('chooses decimals from the tick step', () => {
    expect(tickDecimals([-20, 0, 20])).toBe(0);
    expect(tickDecimals([0, 0.5, 1])).toBe(1);
    expect(tickDecimals([0, 0.05, 0.1])).toBe(2);
    expect(tickDecimals([0])).toBe(0);
  });

  it('shortens labels that do not fit their band', () => {
    expect(fitLabel('Hydroformylation', 200)).toBe('Hydroformylation');
    expect(fitLabel('Hydroformylation', 50)).toBe('Hydro…');
  });
});
