// Group thermo values: H298 (kJ/mol), S298 (J/(mol K)) and Cp at the 7 RMG temperatures.
import type { ThermoNumbersJson } from './group-json';

export const CP_TEMPERATURES_K = [300, 400, 500, 600, 800, 1000, 1500] as const;

export interface ThermoValues {
  H: number;
  S: number;
  Cp: number[];
}

export const zeroThermo = (): ThermoValues => ({ H: 0, S: 0, Cp: CP_TEMPERATURES_K.map(() => 0) });

export function fromJson(json: ThermoNumbersJson): ThermoValues {
  return { H: json.H298, S: json.S298, Cp: [...json.Cp] };
}

export function addThermo(into: ThermoValues, v: ThermoValues, factor = 1): void {
  into.H += factor * v.H;
  into.S += factor * v.S;
  for (let i = 0; i < into.Cp.length; i += 1) into.Cp[i]! += factor * (v.Cp[i] ?? 0);
}

export function isZero(v: ThermoValues): boolean {
  return v.H === 0 && v.S === 0 && v.Cp.every((c) => c === 0);
}

export function averageThermo(list: readonly ThermoValues[]): ThermoValues {
  const sum = zeroThermo();
  for (const v of list) addThermo(sum, v);
  return { H: sum.H / list.length, S: sum.S / list.length, Cp: sum.Cp.map((c) => c / list.length) };
}
