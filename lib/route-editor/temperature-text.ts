// Reads a step's temperature string ("600 K", "327 degC") for display only; the engine parses it for real.
export const DEFAULT_TEMPERATURE_K = 298.15;

const QUANTITY = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*(K|kelvin|degC|°\s*C|celsius|degF|°\s*F|fahrenheit)\s*$/i;

/** Kelvin, the default 298.15 K for a blank field, or null when the text is not a plain temperature. */
export function temperatureKOf(text: string | undefined): number | null {
  if (text === undefined || text.trim() === '') return DEFAULT_TEMPERATURE_K;
  const match = QUANTITY.exec(text.replace(/\u2212/g, '-'));
  if (!match) return null;
  const value = Number(match[1]);
  const unit = match[2]!.replace(/\s+/g, '').toLowerCase();
  if (unit === 'k' || unit === 'kelvin') return value;
  if (unit === 'degc' || unit === '°c' || unit === 'celsius') return value + 273.15;
  return ((value - 32) * 5) / 9 + 273.15;
}
