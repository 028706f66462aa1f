// Public API of the thermodynamics engine.
export { ThermoError, isThermoError, type ThermoErrorCode } from './errors';
export { parseSpecies, type Phase, type SpeciesRef, type AliasResolver } from './notation';
export { parseEquation, formatEquation, reverseEquation, scaleEquation, type ParsedEquation, type Term } from './equation';
export { checkBalance, describeImbalance, balanceEquation, type BalanceReport } from './balance';

export { evaluateStep, type EvaluateResponse, type Direction, type SpeciesProvenance } from './evaluate';
export { runFit, type FitResponse } from './fit-request';
export { fitVantHoff, kAtTemperature, kFromLnK, type FitPoint, type VantHoffFit, type KValue } from './fit';
export { builtinLookup, builtinSpecies, layeredLookup, libraryMeta, type SpeciesLookup, type SpeciesOrigin } from './species-library';
export type { SpeciesRecord, CpModel, Nasa9Cp, ConstantCp, SpeciesFlag, LibraryPhase } from './species-types';
export {
  parseQuantity,
  parseTemperature,
  parsePressure,
  parseConcentration,
  parseAmount,
  parseVolume,
  parseEnergy,
  type QuantityKind,
} from './units';
export { reactionThermoAt, lnKFromDeltaG, type ReactionSpecies, type ReactionThermo } from './reaction-thermo';
export { speciesStateAt, speciesRange } from './species-state';
export { findCrossover } from './crossover';
export { solveEquilibrium, type EquilibriumInput, type EquilibriumResult } from './equilibrium';
export type { EquilibriumSummary } from './equilibrium-request';
export { reactionUncertainty, speciesSigma, type UncertaintyResult, type SigmaSource } from './uncertainty';
export { EngineInvariantError } from './sanitise';
export type { EngineWarning, WarningCode } from './warnings';
export { R_GAS, FARADAY, T_REF, ATM_IN_BAR } from './constants';
