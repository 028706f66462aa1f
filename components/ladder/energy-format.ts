// Display units for energies and temperatures. The engine speaks kJ and K; these helpers only convert
// and format, so a view never re-implements a factor.

export type EnergyUnit = 'kJ' | 'kcal';
export type TemperatureUnit = 'K' | 'degC';

/** The thermochemical calorie: 1 cal = 4.184 J exactly, by definition. */
export const KJ_PER_KCAL = 4.184;
/** 0 °C = 273.15 K exactly, by definition of the Celsius scale. */
export const KELVIN_AT_ZERO_CELSIUS = 273.15;

const MINUS = '\u2212';

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

/** Fixed decimals with a real minus sign, and no "−0.0" for values that round to zero. */
export function formatSigned(value: number, decimals: number, opts: { plus?: boolean } = {}): string {
  const text = Math.abs(value).toFixed(decimals);
  if (Number(text) === 0) return text;
  if (value < 0) return `${MINUS}${text}`;
  return opts.plus === false ? text : `+${text}`;
}

/** "+12.3 kJ", "−4.1 kcal"; "—" when there is no value. */
export function formatEnergy(kJ: number | null | undefined, unit: EnergyUnit, opts: { perMol?: boolean } = {}): string {
  if (kJ === null || kJ === undefined || !Number.isFinite(kJ)) return '—';
  const suffix = opts.perMol ? `${energyUnitLabel(unit)}/mol` : energyUnitLabel(unit);
  return `${formatSigned(energyFromKJ(kJ, unit), 1)} ${suffix}`;
}

/** A change of temperature, which is the same size in K and °C: "+50 K", "−50 °C". */
export function formatTemperatureChange(deltaK: number, unit: TemperatureUnit): string {
  return `${formatSigned(deltaK, 0)} ${temperatureUnitLabel(unit)}`;
}

/** "298.15 K", "25 °C": at most two decimals, trailing zeros dropped; "—" when there is no value. */
export function formatTemperature(K: number | null | undefined, unit: TemperatureUnit): string {
  if (K === null || K === undefined || !Number.isFinite(K)) return '—';
  // Rounding first keeps 298.15 K − 273.15 from printing as 24.999…
  const value = Number(temperatureFromK(K, unit).toFixed(2));
  const text = Object.is(value, -0) ? '0' : String(value).replace('-', MINUS);
  return `${text} ${temperatureUnitLabel(unit)}`;
}

/** The engine's quantity string for a temperature in K, e.g. "350 K", as a step's temperature field takes it. */
export function temperatureQuantity(K: number): string {
  return `${Number(K.toFixed(2))} K`;
}

/** Plain numbers for amounts and multiples: up to `digits` significant figures, no exponent for everyday sizes. */
export function formatNumber(x: number | null | undefined, digits = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  const abs = Math.abs(x);
  const text = abs >= 1e-3 && abs < 1e6 ? String(Number(x.toPrecision(digits))) : x.toExponential(digits - 1);
  return text.replace(/-/g, MINUS);
}
