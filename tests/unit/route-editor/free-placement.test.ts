import { describe, expect, it } from 'vitest';
import { freePlacement, type Rect } from '@/lib/route-editor/free-placement';

const size = { width: 256, height: 200 };
const opts = { size, grid: 24, gap: 24 };
const clear = (p: { x: number; y: number }, rects: Rect[], gap = 24) =>
  rects.every((r) => p.x >= r.x + r.width + gap || r.x >= p.x + size.width + gap || p.y >= r.y + r.height + gap || r.y >= p.y + size.height + gap);

describe('free placement of a new step', () => {
  it('takes the preferred point, snapped to the grid, on an empty board', () => {
    expect(freePlacement([], { x: 0, y: 0 }, opts)).toEqual({ x: 0, y: 0 });
    expect(freePlacement([], { x: 37, y: 61 }, opts)).toEqual({ x: 48, y: 72 });
  });

  it('never lands on another node: a click on the same spot three times gives three separate places', () => {
    const rects: Rect[] = [];
    for (let i = 0; i < 3; i++) {
      const p = freePlacement(rects, { x: 100, y: 100 }, opts);
      expect(clear(p, rects)).toBe(true);
      rects.push({ ...p, ...size });
    }
    expect(new Set(rects.map((r) => `${r.x},${r.y}`)).size).toBe(3);
  });

  it('moves the shortest way out of the way: a wide node above sends the new one just below it', () => {
    const wide: Rect = { x: -1000, y: 0, width: 3000, height: 120 };
    // Below the node plus the gap is y = 144, which is on the grid.
    expect(freePlacement([wide], { x: 0, y: 24 }, opts)).toEqual({ x: 0, y: 144 });
  });

  it('chooses the nearest free grid point, not merely the first ring that has one', () => {
    // A node to the right of the preferred point leaves the left side open.
    const node: Rect = { x: 100, y: -50, width: 256, height: 300 };
    const p = freePlacement([node], { x: 0, y: 0 }, opts);
    expect(clear(p, [node])).toBe(true);
    // Left of the node: x + 256 + 24 <= 100, so x <= -180, the nearest grid point being -192.
    expect(p).toEqual({ x: -192, y: 0 });
  });

  it('fills a hole between nodes when the new step fits there', () => {
    const left: Rect = { x: 0, y: 0, width: 256, height: 200 };
    const right: Rect = { x: 600, y: 0, width: 256, height: 200 };
    const p = freePlacement([left, right], { x: 290, y: 0 }, opts);
    expect(clear(p, [left, right])).toBe(true);
    expect(p.y).toBe(0);
    expect(p.x).toBeGreaterThanOrEqual(280);
    expect(p.x + 256 + 24).toBeLessThanOrEqual(600);
  });

  it('answers the snapped preferred point when no free place is within reach', () => {
    const wall: Rect = { x: -10_000, y: -10_000, width: 20_000, height: 20_000 };
    expect(freePlacement([wall], { x: 5, y: 5 }, { ...opts, maxRings: 3 })).toEqual({ x: 0, y: 0 });
  });
});
