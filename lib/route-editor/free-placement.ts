// Where a new step goes on the board: the grid point nearest the preferred one where its box touches no other node.
// Pure, so palette clicks, drops and keyboard adds all place steps the same way and tests can pin it.

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface Point {
  x: number;
  y: number;
}

export interface PlacementOptions {
  /** the new node's size; its height is a guess until it is drawn */
  size: { width: number; height: number };
  /** grid spacing, the board's background dots */
  grid?: number;
  /** clear space kept around every node */
  gap?: number;
  /** how many grid rings to search before giving up and answering the preferred point */
  maxRings?: number;
}

export const NEW_NODE_SIZE = { width: 256, height: 200 };
const DEFAULT_GRID = 24;
const DEFAULT_GAP = 24;

const overlaps = (a: Rect, b: Rect, gap: number) =>
  a.x < b.x + b.width + gap && b.x < a.x + a.width + gap && a.y < b.y + b.height + gap && b.y < a.y + a.height + gap;

/** The free grid position (top-left corner) nearest `preferred`; ties go to the upper, then the left one. */
export function freePlacement(existing: readonly Rect[], preferred: Point, options: PlacementOptions): Point {
  const grid = options.grid ?? DEFAULT_GRID;
  const gap = options.gap ?? DEFAULT_GAP;
  const maxRings = options.maxRings ?? 200;
  const { width, height } = options.size;
  const origin = { x: Math.round(preferred.x / grid) * grid, y: Math.round(preferred.y / grid) * grid };
  const isFree = (p: Point) => !existing.some((r) => overlaps({ x: p.x, y: p.y, width, height }, r, gap));
  const distance = (p: Point) => Math.hypot(p.x - preferred.x, p.y - preferred.y);

  let best: { point: Point; d: number } | null = null;
  for (let ring = 0; ring <= maxRings; ring++) {
    // Every point of a later ring is at least (ring - 1) grid steps away: stop once none can beat the best.
    if (best && (ring - 1) * grid > best.d) break;
    for (const point of ringPoints(origin, ring, grid)) {
      if (!isFree(point)) continue;
      const d = distance(point);
      if (!best || d < best.d - 1e-9 || (Math.abs(d - best.d) <= 1e-9 && (point.y < best.point.y || (point.y === best.point.y && point.x < best.point.x)))) {
        best = { point, d };
      }
    }
  }
  return best?.point ?? origin;
}

/** The grid points at Chebyshev distance `ring` from `origin`. */
function ringPoints(origin: Point, ring: number, grid: number): Point[] {
  if (ring === 0) return [origin];
  const points: Point[] = [];
  for (let i = -ring; i <= ring; i++) {
    points.push({ x: origin.x + i * grid, y: origin.y - ring * grid }, { x: origin.x + i * grid, y: origin.y + ring * grid });
  }
  for (let j = -ring + 1; j <= ring - 1; j++) {
    points.push({ x: origin.x - ring * grid, y: origin.y + j * grid }, { x: origin.x + ring * grid, y: origin.y + j * grid });
  }
  return points;
}
