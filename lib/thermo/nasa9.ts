// NASA Glenn 9-coefficient polynomials: Cp°, H°, S° of one species at T.
// Records of one aggregate state chain (Fe α → γ → δ); each record's H° already carries the
// transition enthalpies, so picking the record that covers T is all the chaining needed.
import type { Nasa9Cp, Nasa9Interval, Nasa9Record } from './species-types';

export interface Nasa9Point {
  Cp_J_per_K: number;
  H_J: number;
  S_J_per_K: number;
  /** name of the phase record used */
  record: string;
  /** false when T lies outside every record and the nearest interval was extrapolated */
  inRange: boolean;
}

export function nasa9Range(cp: Nasa9Cp): [number, number] {
  const first = cp.records[0];
  const last = cp.records[cp.records.length - 1];
  if (!first || !last) return [Number.NaN, Number.NaN];
  return [first.Tmin, last.Tmax];
}

// Half-open [Tmin, Tmax) picks the higher record at a shared boundary (e.g. KOH(b) at 298.15 K),
// the last one is closed so its upper limit still counts as covered. Returns -1 when no record
// covers T. Index-based so the hot path allocates nothing.
function coveringRecord(cp: Nasa9Cp, T: number): number {
  const records = cp.records;
  for (let r = 0; r < records.length; r++) {
    const rec = records[r]!;
    if (T >= rec.Tmin && (T < rec.Tmax || (r === records.length - 1 && T === rec.Tmax))) return r;
  }
  return -1;
}

function intervalIn(rec: Nasa9Record, T: number): Nasa9Interval {
  const ints = rec.intervals;
  for (let i = 0; i < ints.length - 1; i++) if (T < ints[i]!.Thigh) return ints[i]!;
  return ints[ints.length - 1]!;
}

// Outside all records: extrapolate the nearest end interval (callers say so).
function outsideRecord(cp: Nasa9Cp, T: number): { rec: Nasa9Record; iv: Nasa9Interval } {
  const records = cp.records;
  const low = T < records[0]!.Tmin;
  const rec = low ? records[0]! : records[records.length - 1]!;
  return { rec, iv: low ? rec.intervals[0]! : rec.intervals[rec.intervals.length - 1]! };
}

/** The interval used at T (extrapolated when outside every record). */
function nasa9Interval(cp: Nasa9Cp, T: number): Nasa9Interval {
  const r = coveringRecord(cp, T);
  return r >= 0 ? intervalIn(cp.records[r]!, T) : outsideRecord(cp, T).iv;
}

function pick(cp: Nasa9Cp, T: number): { interval: Nasa9Interval; record: string; inRange: boolean } {
  const r = coveringRecord(cp, T);
  if (r >= 0) return { interval: intervalIn(cp.records[r]!, T), record: cp.records[r]!.name, inRange: true };
  const { rec, iv } = outsideRecord(cp, T);
  return { interval: iv, record: rec.name, inRange: false };
}

export function cpOverR(iv: Nasa9Interval, T: number): number {
  const a = iv.a;
  return (
    a[0]! / (T * T) + a[1]! / T + a[2]! + T * (a[3]! + T * (a[4]! + T * (a[5]! + T * a[6]!)))
  );
}

export function hOverRT(iv: Nasa9Interval, T: number): number {
  return hOverRTWithLn(iv, T, Math.log(T));
}

export function sOverR(iv: Nasa9Interval, T: number): number {
  return sOverRWithLn(iv, T, Math.log(T));
}

// The same polynomials given ln T, so a caller evaluating many species at one T takes the log once.
function hOverRTWithLn(iv: Nasa9Interval, T: number, lnT: number): number {
  const a = iv.a;
  return (
    -a[0]! / (T * T) +
    (a[1]! * lnT) / T +
    a[2]! +
    T * (a[3]! / 2 + T * (a[4]! / 3 + T * (a[5]! / 4 + (T * a[6]!) / 5))) +
    iv.b[0]! / T
  );
}

function sOverRWithLn(iv: Nasa9Interval, T: number, lnT: number): number {
  const a = iv.a;
  return (
    -a[0]! / (2 * T * T) -
    a[1]! / T +
    a[2]! * lnT +
    T * (a[3]! + T * (a[4]! / 2 + T * (a[5]! / 3 + (T * a[6]!) / 4))) +
    iv.b[1]!
  );
}

/** H° (J/mol) and S° (J/(mol K)) at T into `out`, exactly as nasa9At computes them, allocating nothing. */
export function nasa9HSInto(cp: Nasa9Cp, T: number, lnT: number, out: { H_J: number; S_J_per_K: number }): void {
  const iv = nasa9Interval(cp, T);
  out.H_J = cp.R * T * hOverRTWithLn(iv, T, lnT);
  out.S_J_per_K = cp.R * sOverRWithLn(iv, T, lnT);
}

export function nasa9At(cp: Nasa9Cp, T: number): Nasa9Point {
  const { interval, record, inRange } = pick(cp, T);
  return {
    Cp_J_per_K: cp.R * cpOverR(interval, T),
    H_J: cp.R * T * hOverRT(interval, T),
    S_J_per_K: cp.R * sOverR(interval, T),
    record,
    inRange,
  };
}
