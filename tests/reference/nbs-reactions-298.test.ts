// ΔrH°, ΔrS°, ΔrG° at 298.15 K against sums worked out by hand from the printed
// NBS Tables 1982 (Wagman et al., J. Phys. Chem. Ref. Data 11, Suppl. 2). The species values
// used are listed beside each reaction as (ΔfH° kJ/mol, ΔfG° kJ/mol, S° J/(mol K)).
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { evaluateStep } from '@/lib/thermo';

interface Case {
  equation: string;
  values: string;
  dH: number;
  dS: number;
  dG: number;
}

const TOL_KJ = 0.01;
const TOL_J_PER_K = 0.01;

const CASES: Case[] = [
  { equation: 'H2(g) + 1/2 O2(g) -> H2O(l)', values: 'H2O(l) −285.830, −237.129, 69.91; H2 S 130.684; O2 S 205.138', dH: -285.83, dS: -163.343, dG: -237.129 },
  { equation: 'C(s) + O2(g) -> CO2(g)', values: 'CO2(g) −393.509, −394.359, 213.74; C(graphite) S 5.740', dH: -393.509, dS: 2.862, dG: -394.359 },
  { equation: 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)', values: 'CH4(g) −74.81, −50.72, 186.264', dH: -890.359, dS: -242.98, dG: -817.897 },
  { equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', values: 'NH3(g) −46.11, −16.45, 192.45; N2 S 191.61', dH: -92.22, dS: -198.762, dG: -32.9 },
  { equation: 'CaCO3(s) -> CaO(s) + CO2(g)', values: 'calcite −1206.92, −1128.79, 92.9; CaO −635.09, −604.03, 39.75', dH: 178.321, dS: 160.59, dG: 130.401 },
  { equation: 'CO(g) + H2O(g) -> CO2(g) + H2(g)', values: 'CO −110.525, −137.168, 197.674; H2O(g) −241.818, −228.572, 188.825', dH: -41.166, dS: -42.075, dG: -28.619 },
  { equation: '2 SO2(g) + O2(g) -> 2 SO3(g)', values: 'SO2 −296.830, −300.194, 248.22; SO3 −395.72, −371.06, 256.76', dH: -197.78, dS: -188.058, dG: -141.732 },
  { equation: 'H2O(l) -> H+(aq) + OH-(aq)', values: 'OH−(aq) −229.994, −157.244, −10.75; H+(aq) 0, 0, 0', dH: 55.836, dS: -80.66, dG: 79.885 },
  { equation: 'Zn(s) + Cu+2(aq) -> Zn+2(aq) + Cu(s)', values: 'Zn2+ −153.89, −147.06, −112.1; Cu2+ 64.77, 65.49, −99.6; Zn S 41.63; Cu S 33.150', dH: -218.66, dS: -20.98, dG: -212.55 },
  { equation: 'NaCl(s) -> Na+(aq) + Cl-(aq)', values: 'NaCl −411.153, −384.138, 72.13; Na+ −240.12, −261.905, 59.0; Cl− −167.159, −131.228, 56.5', dH: 3.874, dS: 43.37, dG: -8.995 },
  { equation: 'CH3COOH(aq) -> CH3COO-(aq) + H+(aq)', values: 'CH3COOH(ao) −485.76, −396.46, 178.7; CH3COO− −486.01, −369.31, 86.6', dH: -0.25, dS: -92.1, dG: 27.15 },
  { equation: 'C2H5OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)', values: 'C2H5OH(l) −277.69, −174.78, 160.7', dH: -1366.818, dS: -138.904, dG: -1325.325 },
  { equation: 'C(s) -> C(diamond)', values: 'diamond 1.895, 2.900, 2.377', dH: 1.895, dS: -3.363, dG: 2.9 },
  { equation: 'NH3(g) + HCl(g) -> NH4Cl(s)', values: 'HCl(g) −92.307, −95.299, 186.908; NH4Cl −314.43, −202.87, 94.6', dH: -176.013, dS: -284.758, dG: -91.121 },
  { equation: 'Fe2O3(s) + 3 CO(g) -> 2 Fe(s) + 3 CO2(g)', values: 'hematite −824.2, −742.2, 87.40; Fe S 27.28', dH: -24.752, dS: 15.358, dG: -29.373 },
  { equation: '2 NO2(g) -> N2O4(g)', values: 'NO2 33.18, 51.31, 240.06; N2O4 9.16, 97.89, 304.29', dH: -57.2, dS: -175.83, dG: -4.73 },
  { equation: 'NH4+(aq) -> NH3(aq) + H+(aq)', values: 'NH4+ −132.51, −79.31, 113.4; NH3(ao) −80.29, −26.50, 111.3', dH: 52.22, dS: -2.1, dG: 52.81 },
  { equation: 'C2H4(g) + H2(g) -> C2H6(g)', values: 'C2H4 52.26, 68.15, 219.56; C2H6 −84.68, −32.82, 229.60', dH: -136.94, dS: -120.644, dG: -100.97 },
  { equation: 'H2(g) + Cl2(g) -> 2 HCl(g)', values: 'Cl2 S 223.066', dH: -184.614, dS: 20.066, dG: -190.598 },
];

describe('reaction values at 298.15 K against NBS Tables 1982 (Wagman et al.), worked by hand', () => {
  it.each(CASES)('$equation  [$values]', ({ equation, dH, dS, dG }) => {
    const r = evaluateStep({ equation }, { lookup: nbsLookup });
    expect(r.temperature_K).toBe(298.15);
    expect(Math.abs(r.deltaH0_kJ - dH)).toBeLessThanOrEqual(TOL_KJ);
    expect(Math.abs(r.deltaS0_J_per_K - dS)).toBeLessThanOrEqual(TOL_J_PER_K);
    expect(Math.abs(r.deltaG0_kJ - dG)).toBeLessThanOrEqual(TOL_KJ);
  });

  it('reproduces the tabulated ΔfG° exactly at 298.15 K, not H − TS (NBS Tables 1982: Na2CO3(s) ΔfG° −1044.44)', () => {
    // Na2CO3 is a "G-H-S relaxed" NBS row: H − TS would give about −1046.9 kJ/mol.
    const r = evaluateStep({ equation: '2 Na(s) + C(s) + 3/2 O2(g) -> Na2CO3(s)' }, { lookup: nbsLookup });
    expect(r.deltaG0_kJ).toBe(-1044.44);
    expect(r.deltaH0_kJ).toBe(-1130.68);
    expect(r.warnings.map((w) => w.code)).toContain('GHS_INCONSISTENT');
  });
});

describe('independent published values at 298.15 K', () => {
  const lnTen = Math.log(10);
  const pK = (dG_kJ: number): number => (dG_kJ * 1000) / (8.314462618 * 298.15 * lnTen);

  it('water formation against CODATA Key Values 1989 (from memory): ΔfH° −285.830 ± 0.040 kJ/mol, S°(H2O,l) 69.95 ± 0.03', () => {
    const r = evaluateStep({ equation: 'H2(g) + 1/2 O2(g) -> H2O(l)' }, { lookup: nbsLookup });
    expect(Math.abs(r.deltaH0_kJ - -285.83)).toBeLessThanOrEqual(0.04);
    // NBS S°(H2O,l) 69.91 sits 0.04 below CODATA; the S° sum must stay within that spread plus σ.
    const sWater = r.deltaS0_J_per_K + 130.684 + 205.138 / 2;
    expect(Math.abs(sWater - 69.95)).toBeLessThanOrEqual(0.04 + 0.03);
  });

  it('CO2 formation against CODATA Key Values 1989 (from memory): ΔfH° −393.51 ± 0.13 kJ/mol', () => {
    const r = evaluateStep({ equation: 'C(s) + O2(g) -> CO2(g)' }, { lookup: nbsLookup });
    expect(Math.abs(r.deltaH0_kJ - -393.51)).toBeLessThanOrEqual(0.13);
  });

  it('ionic product of water pKw = 13.995 at 25 °C (Harned & Owen; from memory)', () => {
    expect(pK(evaluateStep({ equation: 'H2O(l) -> H+(aq) + OH-(aq)' }, { lookup: nbsLookup }).deltaG0_kJ)).toBeCloseTo(13.995, 2);
  });

  it('acetic acid pKa = 4.756 at 25 °C (Harned & Ehlers 1932; from memory)', () => {
    expect(pK(evaluateStep({ equation: 'CH3COOH(aq) -> CH3COO-(aq) + H+(aq)' }, { lookup: nbsLookup }).deltaG0_kJ)).toBeCloseTo(4.756, 2);
  });

  it('ammonium pKa = 9.245 at 25 °C (Bates & Pinching 1949; from memory), within 0.01', () => {
    const v = pK(evaluateStep({ equation: 'NH4+(aq) -> NH3(aq) + H+(aq)' }, { lookup: nbsLookup }).deltaG0_kJ);
    expect(Math.abs(v - 9.245)).toBeLessThanOrEqual(0.01);
  });

  it('Daniell cell E° = 1.104 V from E°(Cu2+/Cu) = +0.3419 V and E°(Zn2+/Zn) = −0.7618 V (CRC Handbook; from memory)', () => {
    const r = evaluateStep({ equation: 'Zn(s) + Cu+2(aq) -> Zn+2(aq) + Cu(s)', electrons: 2 }, { lookup: nbsLookup });
    expect(Math.abs(r.cellPotential_V! - 1.1037)).toBeLessThanOrEqual(0.005);
  });

  it('H2/O2 cell E° = 1.229 V (common textbook value, from memory)', () => {
    const r = evaluateStep({ equation: 'H2(g) + 1/2 O2(g) -> H2O(l)', electrons: 2 }, { lookup: nbsLookup });
    expect(r.cellPotential_V!).toBeCloseTo(1.229, 3);
  });

  it('vapour pressure of water at 25 °C = 3.1699 kPa (IAPWS-95 / Wagner & Pruss 2002; from memory), within 1 %', () => {
    const r = evaluateStep({ equation: 'H2O(l) -> H2O(g)' }, { lookup: nbsLookup });
    expect(Math.abs(r.K! / 0.031699 - 1)).toBeLessThanOrEqual(0.01);
  });

  it('water boils at 372.76 K under 1 bar (IAPWS-95; from memory), within 1 K for the ideal-gas standard state', () => {
    const r = evaluateStep({ equation: 'H2O(l) -> H2O(g)' }, { lookup: nbsLookup });
    expect(Math.abs(r.crossover_K! - 372.76)).toBeLessThanOrEqual(1);
  });

  it('1 atm standard state: ΔfG°(H2O,l) = −237.178 kJ/mol in the older 1 atm tables (NBS Technical Note 270; from memory)', () => {
    const r = evaluateStep({ equation: 'H2(g) + 1/2 O2(g) -> H2O(l)', standardPressure: '1 atm' }, { lookup: nbsLookup });
    expect(r.deltaG0_kJ).toBeCloseTo(-237.178, 3);
  });
});
