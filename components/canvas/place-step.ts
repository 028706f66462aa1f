// Where a step added from the palette (click, drag or keyboard) lands: the free spot nearest the wanted one, measured
// against the nodes as drawn (their size once React Flow has measured them, else the usual size of a new node).
import { freePlacement, NEW_NODE_SIZE, type Point } from '@/lib/route-editor/free-placement';

export interface PlacedStep {
  id: string;
  position: Point;
}

export function placeNewStep(steps: readonly PlacedStep[], sizeOf: (id: string) => { width?: number | null; height?: number | null } | undefined, preferred: Point): Point {
  const rects = steps.map((s) => {
    const size = sizeOf(s.id);
    return { ...s.position, width: size?.width ?? NEW_NODE_SIZE.width, height: size?.height ?? NEW_NODE_SIZE.height };
  });
  return freePlacement(rects, preferred, { size: NEW_NODE_SIZE });
}
