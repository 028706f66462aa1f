// The ideal-gas formation values (1 bar, one temperature) that the phase conversions start from. Any
// gas-phase estimate with these fields fits; the RMG-tree estimate satisfies it structurally.

export interface GasValues {
  dfH_kJ: number;
  S_J_per_K: number;
  dfG_kJ: number;
  sigma_dfH_kJ: number;
  sigma_S_J_per_K: number;
  sigma_dfG_kJ: number;
}
