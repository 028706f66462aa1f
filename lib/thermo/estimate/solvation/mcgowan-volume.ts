// McGowan characteristic volume V (Abraham & McGowan 1987): Σ atomic increments − 6.56 per bond,
// in cm³/mol, divided by 100 as the Abraham descriptor. Atomic increments from memory (they are the
// widely reprinted table); V is reported for completeness and does not enter the water equations.
import { ThermoError } from '../../errors';

const ATOM_VOLUME: Record<string, number> = { C: 16.35, H: 8.71, O: 12.43, N: 14.39, F: 10.48, Cl: 20.95, Br: 26.21, I: 34.53, S: 22.91, P: 24.87, Si: 26.83 };

/** V from the composition and ring count: bonds = atoms − 1 + rings, every bond order counted once. */
export function mcgowanVolume(elements: Record<string, number>, rings: number): number {
  let sum = 0;
  let atoms = 0;
  for (const [e, n] of Object.entries(elements)) {
    const v = ATOM_VOLUME[e];
    if (v === undefined) throw new ThermoError('UNSUPPORTED_STRUCTURE', `No McGowan volume increment for element ${e}.`, { field: 'smiles', hint: 'Abraham descriptors cover organic elements only.' });
    sum += n * v;
    atoms += n;
  }
  return (sum - 6.56 * (atoms - 1 + rings)) / 100;
}
