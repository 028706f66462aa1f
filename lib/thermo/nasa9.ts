// NASA Glenn 9-coefficient polynomials: Cp°, H°, S° of one species at T.
// Records of one aggregate state chain (Fe α → γ → δ); each record's H° already carries the
// transition enthalpies, so picking the record that covers T is all the chaining needed.
import type { Nasa9Cp, Nasa9Interval } from './species-types';

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
// the last one is closed so its upper limit still counts as covered.
function pick(cp: Nasa9Cp, T: number): { interval: Nasa9Interval; record: string; inRange: boolean } {
  const records = cp.records;
  for (let r = 0; r < records.length; r++) {
    const rec = records[r]!;
    const isLast = r === records.length - 1;
    if (T >= rec.Tmin && (T < rec.Tmax || (isLast && T === rec.Tmax))) {
      const ints = rec.intervals;
      for (let i = 0; i < ints.length; i++) {
        const iv = ints[i]!;
        if (T < iv.Thigh || i === ints.length - 1) return { interval: iv, record: rec.name, inRange: true };
      }
    }
  }
  // Outside all records: extrapolate the nearest end interval and say so.
  const low = T < records[0]!.Tmin;
  const rec = low ? records[0]! : records[records.length - 1]!;
  const iv = low ? rec.intervals[0]! : rec.intervals[rec.intervals.length - 1]!;
  return { interval: iv, record: rec.name, inRange: false };
}

export function cpOverR(iv: Nasa9Interval, T: number): number {
  const a = iv.a;
  return (
    a[0]! / (T * T) + a[1]! / T + a[2]! + T * (a[3]! + T * (a[4]! + T * (a[5]! + T * a[6]!)))
  );
}

export function hOverRT(iv: Nasa9Interval, T: number): number {
  const a = iv.a;
  return (
    -a[0]! / (T * T) +
    (a[1]! * Math.log(T)) / T +
    a[2]! +
    T * (a[3]! / 2 + T * (a[4]! / 3 + T * (a[5]! / 4 + (T * a[6]!) / 5))) +
    iv.b[0]! / T
  );
}

export function sOverR(iv: Nasa9Interval, T: number): number {
  const a = iv.a;
  return (
    -a[0]! / (2 * T * T) -
    a[1]! / T +
    a[2]! * Math.log(T) +
    T * (a[3]! + T * (a[4]! / 2 + T * (a[5]! / 3 + (T * a[6]!) / 4))) +
    iv.b[1]!
  );
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
