// Quantity strings at the request boundary ("700 K", "25 degC", "2 bar") → plain numbers in the
// engine's units (K, bar, mol/L, mol, L, kJ). Everything past this file is unit-free.
import { create, createUnitDependencies, unitDependencies, type Unit } from 'mathjs';
import { ThermoError } from './errors';

// A private instance, so the units we add do not leak into other users of mathjs.
// (The typings declare the dependency maps possibly undefined; they never are.)
if (!unitDependencies || !createUnitDependencies) throw new Error('mathjs unit factories missing');
const math = create({ unitDependencies, createUnitDependencies });
math.createUnit('cal', { definition: '4.184 J', prefixes: 'short' });
math.createUnit('M', { definition: '1 mol/L', prefixes: 'short' });

export type QuantityKind = 'temperature' | 'pressure' | 'concentration' | 'amount' | 'volume' | 'energy';

interface KindSpec {
  target: string;
  reference: Unit;
  accepted: string;
  example: string;
}

const KINDS: Record<QuantityKind, KindSpec> = {
  temperature: { target: 'K', reference: math.unit('1 K'), accepted: 'K, degC, degF', example: '700 K' },
  pressure: { target: 'bar', reference: math.unit('1 bar'), accepted: 'bar, atm, kPa, Pa, mmHg, psi', example: '2 bar' },
  concentration: { target: 'mol/L', reference: math.unit('1 mol/L'), accepted: 'mol/L, mmol/L, M', example: '0.1 mol/L' },
  amount: { target: 'mol', reference: math.unit('1 mol'), accepted: 'mol, mmol, kmol', example: '1 mol' },
  volume: { target: 'L', reference: math.unit('1 L'), accepted: 'L, mL, m^3', example: '1 L' },
  energy: { target: 'kJ', reference: math.unit('1 kJ'), accepted: 'J, kJ, kcal', example: '10 kJ' },
};

// Typographic spellings people paste in.
function normalise(text: string): string {
  return text
    .trim()
    .replace(/°\s*C\b/g, 'degC')
    .replace(/°\s*F\b/g, 'degF')
    .replace(/\bcelsius\b/gi, 'degC')
    .replace(/\bfahrenheit\b/gi, 'degF')
    .replace(/\u2212/g, '-');
}

const NUMBER_ONLY = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

// Fast path for the common "<number> <unit>" strings. Factors come from the mathjs instance
// above and are applied in the order mathjs applies them, so results are bit-identical.
interface FastUnit {
  kind: QuantityKind;
  /** per-part SI factors, multiplied in turn */
  toSI: readonly number[];
  /** SI value of the unit's zero, added only for offset units (degC, degF) */
  offset: number | null;
}

const factorsOf = (parts: readonly string[]): number[] => parts.map((p) => math.unit(`1 ${p}`).value);

function fastUnit(kind: QuantityKind, parts: readonly string[], offsetOf?: string): FastUnit {
  return { kind, toSI: factorsOf(parts), offset: offsetOf === undefined ? null : math.unit(`0 ${offsetOf}`).toNumber('K') };
}

const FAST_UNITS: ReadonlyMap<string, FastUnit> = new Map([
  ['K', fastUnit('temperature', ['K'])],
  ['degC', fastUnit('temperature', ['degC'], 'degC')],
  ['degF', fastUnit('temperature', ['degF'], 'degF')],
  ...(['bar', 'atm', 'kPa', 'Pa', 'mmHg', 'psi'] as const).map((u) => [u, fastUnit('pressure', [u])] as const),
  ['mol/L', fastUnit('concentration', ['mol', 'L^-1'])],
  ['mmol/L', fastUnit('concentration', ['mmol', 'L^-1'])],
  ['M', fastUnit('concentration', ['M'])],
  ...(['mol', 'mmol', 'kmol'] as const).map((u) => [u, fastUnit('amount', [u])] as const),
  ...(['L', 'mL'] as const).map((u) => [u, fastUnit('volume', [u])] as const),
  ...(['J', 'kJ', 'kcal'] as const).map((u) => [u, fastUnit('energy', [u])] as const),
]);

// Divisors back to each kind's engine unit (mol/L is two parts, as mathjs sees it).
const FROM_SI: Readonly<Record<QuantityKind, readonly number[]>> = {
  temperature: factorsOf(['K']),
  pressure: factorsOf(['bar']),
  concentration: factorsOf(['mol', 'L^-1']),
  amount: factorsOf(['mol']),
  volume: factorsOf(['L']),
  energy: factorsOf(['kJ']),
};

const FAST_QUANTITY = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?) ([A-Za-z]+(?:\/L)?)$/;

function fastMatch(text: string): { value: number; unit: FastUnit } | undefined {
  const m = FAST_QUANTITY.exec(text.trim());
  if (m === null) return undefined;
  const unit = FAST_UNITS.get(m[2]!);
  // mathjs drops a leading "+" and reads the rest with parseFloat.
  return unit === undefined ? undefined : { value: Number.parseFloat(m[1]!), unit };
}

/** The fast-path value, or undefined when mathjs must decide (other syntax, kind mismatch, overflow). */
export function fastQuantity(text: string, kind: QuantityKind): number | undefined {
  const hit = fastMatch(text);
  if (hit === undefined || hit.unit.kind !== kind) return undefined;
  let v = hit.value;
  for (const f of hit.unit.toSI) v *= f;
  if (hit.unit.offset !== null) v += hit.unit.offset;
  for (const f of FROM_SI[kind]) v /= f;
  return Number.isFinite(v) ? v : undefined;
}

/** The slow path alone: mathjs for every string. Exported so tests can compare both. */
export function parseQuantitySlow(text: string, kind: QuantityKind, field: string): number {
  return parseWithMathjs(text, kind, field);
}


/** Parses a quantity of the given kind and returns it in the kind's engine unit. */
export function parseQuantity(text: string, kind: QuantityKind, field: string): number {
  if (typeof text === 'string') {
    const fast = fastQuantity(text, kind);
    if (fast !== undefined) return fast;
  }
  return parseWithMathjs(text, kind, field);
}

function parseWithMathjs(text: string, kind: QuantityKind, field: string): number {
  const spec = KINDS[kind];
  if (typeof text !== 'string') {
    throw new ThermoError('INVALID_UNIT', `${field}: expected a quantity string such as "${spec.example}"`, {
      field,
      hint: `write the value with a unit (${spec.accepted})`,
    });
  }
  const s = normalise(text);
  if (NUMBER_ONLY.test(s)) {
    throw new ThermoError('INVALID_UNIT', `${field}: "${text}" has no unit`, {
      field,
      hint: `add a unit, e.g. "${s} ${spec.target}" (accepted: ${spec.accepted})`,
    });
  }
  let u: Unit;
  try {
    u = math.unit(s);
  } catch (err) {
    const reason = err instanceof Error ? err.message : String(err);
    throw new ThermoError('INVALID_UNIT', `${field}: cannot read "${text}" as a ${kind} (${reason})`, {
      field,
      hint: `write a number and a unit, e.g. "${spec.example}" (accepted: ${spec.accepted})`,
    });
  }
  if (u.value === null || !u.equalBase(spec.reference)) {
    throw new ThermoError('INVALID_UNIT', `${field}: "${text}" is not a ${kind}`, {
      field,
      hint: `use one of ${spec.accepted}, e.g. "${spec.example}"`,
    });
  }
  const value = u.toNumber(spec.target);
  if (!Number.isFinite(value)) {
    throw new ThermoError('INVALID_VALUE', `${field}: "${text}" is not a finite number`, { field });
  }
  return value;
}

export const parseTemperature = (text: string, field = 'temperature'): number => parseQuantity(text, 'temperature', field);
export const parsePressure = (text: string, field = 'pressure'): number => parseQuantity(text, 'pressure', field);
export const parseConcentration = (text: string, field = 'concentration'): number =>
  parseQuantity(text, 'concentration', field);
export const parseAmount = (text: string, field = 'amount'): number => parseQuantity(text, 'amount', field);
export const parseVolume = (text: string, field = 'volume'): number => parseQuantity(text, 'volume', field);
export const parseEnergy = (text: string, field = 'energy'): number => parseQuantity(text, 'energy', field);

/** What a quantity string measures, or undefined if it is none of our kinds. */
export function quantityKindOf(text: string): QuantityKind | undefined {
  const hit = fastMatch(text);
  if (hit !== undefined) return hit.unit.kind;
  let u: Unit;
  try {
    u = math.unit(normalise(text));
  } catch {
    return undefined;
  }
  if (u.value === null) return undefined;
  return (Object.keys(KINDS) as QuantityKind[]).find((k) => u.equalBase(KINDS[k].reference));
}
