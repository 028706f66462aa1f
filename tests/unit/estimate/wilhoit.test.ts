// Wilhoit Cp (B = 1000 K) and its Gauss–Legendre integrals.
import { describe, expect, it } from 'vitest';
import { fitWilhoit, wilhoitCp, wilhoitStateAt, type WilhoitCp } from '@/lib/thermo/estimate/wilhoit';

const T7 = [300, 400, 500, 600, 800, 1000, 1500];
// acetanilide's group Cp sum and limits (reference_examples.json)
const ACETANILIDE = { cp: [136.11, 177.428, 211.422, 238.327, 277.508, 305.177, 348.981], Cp0: 33.2579, CpInf: 444.8238 };

describe('Wilhoit form', () => {
  const w = fitWilhoit(T7, ACETANILIDE.cp, ACETANILIDE.Cp0, ACETANILIDE.CpInf, 1000);

  it('tends to Cp0 at 0 K and CpInf at high T (the physical limits built into the form)', () => {
    expect(wilhoitCp(w, 1e-6)).toBeCloseTo(ACETANILIDE.Cp0, 3);
    expect(wilhoitCp(w, 1e9)).toBeCloseTo(ACETANILIDE.CpInf, 1);
  });

  it('reproduces the 7 fitted points within 2 J/(mol K) (rmg-groups README: 0.1–2.0 on its examples)', () => {
    T7.forEach((T, i) => expect(Math.abs(wilhoitCp(w, T) - ACETANILIDE.cp[i]!)).toBeLessThan(2));
  });

  it('recovers coefficients it was generated from', () => {
    const truth: WilhoitCp = { Cp0: 33.26, CpInf: 300, B: 1000, a: [-2, 3, -1, 0.5] };
    const back = fitWilhoit(T7, T7.map((T) => wilhoitCp(truth, T)), truth.Cp0, truth.CpInf, 1000);
    back.a.forEach((a, i) => expect(a).toBeCloseTo(truth.a[i]!, 6));
  });
});

describe('H(T) − H(298.15) and S(T) − S(298.15)', () => {
  it('are zero at 298.15 K', () => {
    const s = wilhoitStateAt(fitWilhoit(T7, ACETANILIDE.cp, ACETANILIDE.Cp0, ACETANILIDE.CpInf), 298.15);
    expect(s.dH_J).toBeCloseTo(0, 9);
    expect(s.dS_J_per_K).toBeCloseTo(0, 9);
  });

  it('are exact for a constant Cp (Cp0 = CpInf): Cp·ΔT and Cp·ln(T/298.15)', () => {
    const flat: WilhoitCp = { Cp0: 29.1, CpInf: 29.1, B: 1000, a: [0, 0, 0, 0] };
    const s = wilhoitStateAt(flat, 1200);
    expect(s.dH_J).toBeCloseTo(29.1 * (1200 - 298.15), 6);
    expect(s.dS_J_per_K).toBeCloseTo(29.1 * Math.log(1200 / 298.15), 9);
  });

  it('agree with a fine trapezoid rule on a fitted curve', () => {
    const w = fitWilhoit(T7, ACETANILIDE.cp, ACETANILIDE.Cp0, ACETANILIDE.CpInf);
    const steps = 200_000;
    let h = 0;
    let s = 0;
    for (let k = 0; k < steps; k += 1) {
      const a = 298.15 + ((1500 - 298.15) * k) / steps;
      const b = 298.15 + ((1500 - 298.15) * (k + 1)) / steps;
      h += ((wilhoitCp(w, a) + wilhoitCp(w, b)) / 2) * (b - a);
      s += ((wilhoitCp(w, a) / a + wilhoitCp(w, b) / b) / 2) * (b - a);
    }
    const q = wilhoitStateAt(w, 1500);
    expect(q.dH_J).toBeCloseTo(h, 1);
    expect(q.dS_J_per_K).toBeCloseTo(s, 4);
    expect(q.Cp_J_per_K).toBeCloseTo(wilhoitCp(w, 1500), 9);
  });
});
