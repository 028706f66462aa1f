// Standard entropies of the elements in their reference states at 298.15 K, per atom, J/(mol K):
// CODATA Key Values (Cox, Wagman & Medvedev 1989), as listed in the estimation and organics data
// READMEs (the diatomics halved). Used for S° = Σ ν_e S°_e + (ΔfH° − ΔfG°)/T.

const PER_MOLE_OF_REFERENCE: Record<string, [entropy: number, atoms: number]> = {
  C: [5.74, 1], // graphite
  H: [130.68, 2],
  O: [205.152, 2],
  N: [191.609, 2],
  S: [32.054, 1], // rhombic
  F: [202.791, 2],
  Cl: [223.081, 2],
  Br: [152.21, 2], // liquid
  I: [116.14, 2], // crystal
  P: [41.09, 1], // white
  Si: [18.81, 1],
  Na: [51.3, 1],
  K: [64.68, 1],
};

/** Σ ν_e S°_e for a composition, or null naming the first element without a value. */
export function elementEntropySum(elements: Record<string, number>): { sum: number } | { missing: string } {
  let sum = 0;
  for (const [e, n] of Object.entries(elements)) {
    const ref = PER_MOLE_OF_REFERENCE[e];
    if (!ref) return { missing: e };
    sum += (n * ref[0]) / ref[1];
  }
  return { sum };
}
