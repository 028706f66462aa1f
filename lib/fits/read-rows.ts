// Text cells → stored points, with one message per bad cell (field `rows.<i>.<column>`), and the
// conversion of stored points to what the fit takes: T in K, ln K and σ(ln K).
import type { FitPoint } from '../thermo/fit';
import type { DataRowInput, StoredPoint, TemperatureUnit, ValueKind } from '../schemas/fit-data';
import { isNumericCell } from './parse-table';

export const CELSIUS_OFFSET = 273.15;

export type FieldErrors = Record<string, string>;

export function toKelvin(T: number, unit: TemperatureUnit): number {
  return unit === 'degC' ? T + CELSIUS_OFFSET : T;
}

/** σ is given in the unit of the value column: σ(ln K) as is, σ(K) by σ(ln K) = σ(K)/K. */
export function toLnK(value: number, sigma: number | null, kind: ValueKind): { lnK: number; sigma_lnK: number | null } {
  if (kind === 'lnK') return { lnK: value, sigma_lnK: sigma };
  return { lnK: Math.log(value), sigma_lnK: sigma === null ? null : sigma / value };
}

function cellNumber(cell: string, where: string, column: string, errors: FieldErrors): number | null {
  if (!isNumericCell(cell)) {
    errors[where] = cell.trim() === '' ? `${column} is empty.` : `${column} “${cell.slice(0, 20)}” is not a number.`;
    return null;
  }
  return Number(cell);
}

export function readRows(rows: readonly DataRowInput[], unit: TemperatureUnit, kind: ValueKind): { points: StoredPoint[]; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const points: StoredPoint[] = [];
  const label = (i: number) => `Row ${i + 1}`;
  rows.forEach((row, i) => {
    const T = cellNumber(row.T, `rows.${i}.T`, `${label(i)}: the temperature`, errors);
    const value = cellNumber(row.value, `rows.${i}.value`, `${label(i)}: ${kind === 'K' ? 'K' : 'ln K'}`, errors);
    const sigma = row.sigma.trim() === '' ? null : cellNumber(row.sigma, `rows.${i}.sigma`, `${label(i)}: σ`, errors);
    if (T !== null && !(toKelvin(T, unit) > 0)) errors[`rows.${i}.T`] = `${label(i)}: ${T} ${unit === 'degC' ? '°C' : 'K'} is at or below 0 K.`;
    if (value !== null && kind === 'K' && !(value > 0)) errors[`rows.${i}.value`] = `${label(i)}: K must be above 0 (got ${value}); for a logarithm choose ln K.`;
    if (sigma !== null && !(sigma > 0)) errors[`rows.${i}.sigma`] = `${label(i)}: σ must be above 0.`;
    if (T !== null && value !== null) points.push({ T, value, sigma, excluded: false, reason: null });
  });
  if (Object.keys(errors).length === 0) Object.assign(errors, setErrors(points, unit));
  return { points, errors };
}

// Whole-set checks: enough points, more than one temperature, σ on every point or on none.
export function setErrors(points: readonly StoredPoint[], unit: TemperatureUnit): FieldErrors {
  const used = points.filter((p) => !p.excluded);
  if (used.length < 3) return { rows: `A fit needs at least 3 points that are not left out; there ${used.length === 1 ? 'is' : 'are'} ${used.length}.` };
  if (new Set(used.map((p) => toKelvin(p.T, unit))).size < 2) return { rows: 'All points are at one temperature; a slope needs at least two.' };
  const withSigma = used.filter((p) => p.sigma !== null).length;
  if (withSigma !== 0 && withSigma !== used.length) return { rows: `Give σ on every point or on none (${withSigma} of ${used.length} have one).` };
  return {};
}

export interface IndexedFitPoint extends FitPoint {
  /** the point's row in the data set */
  index: number;
}

export function toFitPoints(points: readonly StoredPoint[], unit: TemperatureUnit, kind: ValueKind): IndexedFitPoint[] {
  return points.map((p, index) => {
    const { lnK, sigma_lnK } = toLnK(p.value, p.sigma, kind);
    return { index, temperature_K: toKelvin(p.T, unit), lnK, ...(sigma_lnK === null ? {} : { sigma_lnK }) };
  });
}
