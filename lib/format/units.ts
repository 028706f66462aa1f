// Display units for energies and temperatures. The engine speaks kJ and K; these helpers only convert and
// format (through numbers.ts), so a view never re-implements a factor or a precision.
import { formatFixed, formatKelvin, formatSigned, MINUS } from './numbers';

export type EnergyUnit = 'kJ' | 'kcal';
export type TemperatureUnit = 'K' | 'degC';

/** The thermochemical calorie: 1 cal = 4.184 J exactly, by definition. */
export const KJ_PER_KCAL = 4.184;
/** 0 °C = 273.15 K exactly, by definition of the Celsius scale. */
export const KELVIN_AT_ZERO_CELSIUS = 273.15;

export function energyFromKJ(kJ: number, unit: EnergyUnit): number {
  return unit === 'kcal' ? kJ / KJ_PER_KCAL : kJ;
}

export function energyToKJ(value: number, unit: EnergyUnit): number {
  return unit === 'kcal' ? value * KJ_PER_KCAL : value;
}

export function energyUnitLabel(unit: EnergyUnit): string {
  return unit === 'kcal' ? 'kcal' : 'kJ';
}

export function temperatureFromK(K: number, unit: TemperatureUnit): number {
  return unit === 'degC' ? K - KELVIN_AT_ZERO_CELSIUS : K;
}

export function temperatureToK(value: number, unit: TemperatureUnit): number {
  return unit === 'degC' ? value + KELVIN_AT_ZERO_CELSIUS : value;
}

export function temperatureUnitLabel(unit: TemperatureUnit): string {
  return unit === 'degC' ? '°C' : 'K';
}

/** "+12.3 kJ", "−4.1 kcal/mol": to 0.1 with a sign; "—" when there is no value. */
export function formatEnergy(kJ: number | null | undefined, unit: EnergyUnit, opts: { perMol?: boolean } = {}): string {
  if (kJ === null || kJ === undefined || !Number.isFinite(kJ)) return '—';
  const suffix = opts.perMol ? `${energyUnitLabel(unit)}/mol` : energyUnitLabel(unit);
  return `${formatSigned(energyFromKJ(kJ, unit), 1)} ${suffix}`;
}

/** The number alone, to 0.1 and unsigned unless negative ("−235.1"), for tables whose header states the unit. */
export function formatEnergyValue(kJ: number | null | undefined, unit: EnergyUnit = 'kJ'): string {
  if (kJ === null || kJ === undefined || !Number.isFinite(kJ)) return '—';
  return formatFixed(energyFromKJ(kJ, unit), 1);
}

/** A change of temperature, which is the same size in K and °C: "+50 K", "−50 °C". */
export function formatTemperatureChange(deltaK: number, unit: TemperatureUnit): string {
  return `${formatSigned(deltaK, 0)} ${temperatureUnitLabel(unit)}`;
}

/** "650 K", "25 °C": to the kelvin (or degree), the reference 298.15 K as such; "—" when there is no value. */
export function formatTemperature(K: number | null | undefined, unit: TemperatureUnit): string {
  if (K === null || K === undefined || !Number.isFinite(K)) return '—';
  if (unit === 'K') return `${formatKelvin(K)} K`;
  return `${formatFixed(temperatureFromK(K, unit), 0)} °C`;
}

/** The engine's quantity string for a temperature in K, e.g. "350 K", as a step's temperature field takes it (ASCII: it is typed into). */
export function temperatureQuantity(K: number): string {
  return `${Number(K.toFixed(2))} K`;
}

export { MINUS };
