// What people type in the step panel's temperature and pressure fields, read before it reaches the engine: a plain
// number takes the field's unit; a number with a unit of its own ("50 atm" beside a "bar" field) keeps that unit and
// is converted for the note; anything else is refused with the units we take. Pure.

const NUMBER = String.raw`([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)`;
const WITH_UNIT = new RegExp(`^${NUMBER}\\s*([A-Za-z°][A-Za-z° ]*)?$`, 'i');

/** Pressure units the engine reads, each with its size in bar (1 atm = 1.01325 bar and 1 torr = 1/760 atm exactly; 1 psi = 0.0689475729 bar; 1 mmHg = 133.322387415 Pa, common practice). */
export const PRESSURE_UNITS_BAR: Readonly<Record<string, number>> = {
  bar: 1,
  mbar: 1e-3,
  atm: 1.01325,
  Pa: 1e-5,
  kPa: 1e-2,
  MPa: 10,
  psi: 0.0689475729,
  mmHg: 133.322387415e-5,
  torr: 1.01325 / 760,
};

const PRESSURE_NAMES = new Map(Object.keys(PRESSURE_UNITS_BAR).map((u) => [u.toLowerCase(), u]));
const PRESSURE_LIST = 'bar, atm, kPa, Pa, MPa, psi, mmHg or torr';

export type ReadQuantity = { ok: true; text: string; note: string | null } | { ok: false; message: string };

function round(value: number): string {
  return String(Number(value.toPrecision(4)));
}

/** `value` as typed in a pressure field whose unit is `fieldUnit`; text is what the step stores ("" when empty). */
export function readPressure(value: string, fieldUnit: string): ReadQuantity {
  const typed = value.trim().replace(/\u2212/g, '-');
  if (typed === '') return { ok: true, text: '', note: null };
  const m = WITH_UNIT.exec(typed);
  const unit = m?.[2]?.trim() ? PRESSURE_NAMES.get(m[2].trim().toLowerCase()) : fieldUnit;
  if (!m || !unit) {
    return { ok: false, message: `Write a number, or a number with its unit: ${PRESSURE_LIST} (e.g. “50 atm”).` };
  }
  const n = Number(m[1]);
  if (!(n > 0)) return { ok: false, message: 'A pressure is above 0; leave the field empty for the standard state.' };
  const inField = unit === fieldUnit || !(fieldUnit in PRESSURE_UNITS_BAR) ? null : `${round((n * PRESSURE_UNITS_BAR[unit]!) / PRESSURE_UNITS_BAR[fieldUnit]!)} ${fieldUnit}`;
  return { ok: true, text: `${m[1]} ${unit}`, note: inField ? `Read as ${m[1]} ${unit} = ${inField}.` : null };
}

const TEMPERATURE_NAMES: Readonly<Record<string, 'K' | 'degC' | 'degF'>> = {
  k: 'K', kelvin: 'K', degc: 'degC', '°c': 'degC', c: 'degC', celsius: 'degC', degf: 'degF', '°f': 'degF', f: 'degF', fahrenheit: 'degF',
};

function kelvinOf(n: number, unit: 'K' | 'degC' | 'degF'): number {
  if (unit === 'K') return n;
  if (unit === 'degC') return n + 273.15;
  return ((n - 32) * 5) / 9 + 273.15;
}

/** `value` as typed in the temperature field whose unit is `fieldUnit` ("K" or "degC"); "" means 298.15 K. */
export function readTemperature(value: string, fieldUnit: 'K' | 'degC'): ReadQuantity {
  const typed = value.trim().replace(/\u2212/g, '-');
  if (typed === '') return { ok: true, text: '', note: null };
  const m = WITH_UNIT.exec(typed);
  const unit = m?.[2]?.trim() ? TEMPERATURE_NAMES[m[2].replace(/\s+/g, '').toLowerCase()] : fieldUnit;
  if (!m || !unit) return { ok: false, message: 'Write a temperature, or one with its unit: K, °C or °F (e.g. “500 K”).' };
  const K = kelvinOf(Number(m[1]), unit);
  if (!(K > 0)) return { ok: false, message: `${typed} is ${round(K)} K, at or below absolute zero.` };
  const note = unit === fieldUnit ? null : `Read as ${round(K)} K.`;
  return { ok: true, text: `${m[1]} ${unit}`, note };
}
