// Phase conversions of ideal-gas estimates: liquid (vaporisation step) and aqueous (solvation step).
export type { GasValues } from './gas-values';
export type { MatchedGroup } from './matched-group';
export { liquidFromGas, liquidAtTemperature, LIQUID_T_MIN_K, type LiquidEstimate } from './liquid';
export { lnPsatBar, lnPsatBarConstantDvapH, type BoilingData } from './vapour-pressure';
export { estimateJoback, type JobackEstimate } from '../joback';
export { aqueousFromGas, type AqueousEstimate } from './aqueous';
