// Warnings the engine attaches to a result; every approximation it makes is named here.

export type WarningCode =
  | 'T_OUT_OF_RANGE'
  | 'PHASE_CHANGE'
  | 'CONSTANT_CP'
  | 'GHS_INCONSISTENT'
  | 'DEFAULT_ACTIVITY'
  | 'OVERRIDE'
  | 'FROM_MEMORY'
  | 'EQUILIBRIUM_LIMIT'
  | 'INERT_SPECIES'
  | 'SOLVENT_IN_EXCESS'
  | 'FITTED_VALUES';

export interface EngineWarning {
  code: WarningCode;
  message: string;
  /** species keys the warning is about, when it is about species */
  species?: string[];
}

export function fmt(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return String(x);
  return Number(x.toPrecision(digits)).toString();
}
