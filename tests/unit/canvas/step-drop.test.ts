// The palette's drag payload: the equation, and the labels a recent step binds to a structure, read back by the
// canvas; anything that is not a definition object is dropped (the save checks each definition in full).
import { describe, expect, it } from 'vitest';
import { readStepPayload, writeStepPayload, STEP_DRAG_MIME } from '@/components/canvas/step-drop';

function transfer(): DataTransfer {
  const data = new Map<string, string>();
  return { setData: (k: string, v: string) => void data.set(k, v), getData: (k: string) => data.get(k) ?? '', types: [] as string[], effectAllowed: 'none' } as unknown as DataTransfer;
}

describe('step drag payload', () => {
  it('carries the labels a recent step binds', () => {
    const dt = transfer();
    const species = { ketone: { smiles: 'CC(=O)c1ccccc1', phase: 'aq' as const } };
    writeStepPayload(dt, { equation: 'ketone + H2(g) -> alcohol', species });
    expect(readStepPayload(dt)).toEqual({ equation: 'ketone + H2(g) -> alcohol', temperature: undefined, species });
  });

  it('drops a species map that is not definitions, and reads a plain equation as before', () => {
    const dt = transfer();
    dt.setData(STEP_DRAG_MIME, JSON.stringify({ equation: 'H2(g) -> H2(g)', species: { a: 'x', b: [1], c: null } }));
    expect(readStepPayload(dt)).toEqual({ equation: 'H2(g) -> H2(g)', temperature: undefined });
    dt.setData(STEP_DRAG_MIME, '{not json');
    expect(readStepPayload(dt)).toBeNull();
  });
});
