// What the palette hands the canvas through HTML5 drag-and-drop: the equation of the step to add.
export const STEP_DRAG_MIME = 'application/x-stepwell-step';

export interface StepDragPayload {
  equation: string;
  temperature?: string;
}

export function writeStepPayload(dataTransfer: DataTransfer, payload: StepDragPayload): void {
  dataTransfer.setData(STEP_DRAG_MIME, JSON.stringify(payload));
  dataTransfer.setData('text/plain', payload.equation);
  dataTransfer.effectAllowed = 'copy';
}

export function hasStepPayload(dataTransfer: DataTransfer): boolean {
  return Array.from(dataTransfer.types).includes(STEP_DRAG_MIME);
}

export function readStepPayload(dataTransfer: DataTransfer): StepDragPayload | null {
  const raw = dataTransfer.getData(STEP_DRAG_MIME);
  if (!raw) return null;
  try {
    const value = JSON.parse(raw) as Partial<StepDragPayload>;
    if (typeof value.equation !== 'string') return null;
    return { equation: value.equation, temperature: typeof value.temperature === 'string' ? value.temperature : undefined };
  } catch {
    return null;
  }
}
