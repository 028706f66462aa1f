// Coupling partners ranked by what a route designer could add to the step (lib/thermo/route/coupling-partners.ts):
// same phase, shared species, plausible conditions; no solids-only thermite beside a fluid step, no burning of the
// step's own feedstock. The chemistry of the examples is common practice (steam reforming, ethanol dehydrogenation).
import { describe, expect, it } from 'vitest';
import { evaluateStep } from '@/lib/thermo';
import { DEFAULT_DRIVERS } from '@/lib/thermo/route';
import { partnerFit } from '@/lib/thermo/route/coupling-partners';
import { readStoichiometry } from '@/lib/thermo/route/stoichiometry';
import { nbsLookup } from '@/lib/thermo/species-library';
import { single } from './remedy-helpers';

const THERMITE = DEFAULT_DRIVERS.find((d) => d.id === 'aluminothermic-iron')!;
const METHANE = DEFAULT_DRIVERS.find((d) => d.id === 'methane-combustion')!;
const nu = (equation: string) => readStoichiometry(equation, nbsLookup).nu!;
const fit = (step: string, driver: string, T = '298.15 K') => partnerFit(nu(step), nu(driver), evaluateStep({ equation: driver, temperature: T }, { lookup: nbsLookup }), nbsLookup);

describe('coupling partners', () => {
  it('ethanol dehydrogenation at 500 K: hydrogen burnt to steam (shares H2, all gas) leads; thermite and methane combustion do not', () => {
    const { coupling } = single('CH3CHO(g)', { equation: 'C2H5OH(g) -> CH3CHO(g) + H2(g)', temperature: '500 K' }, {}, [...DEFAULT_DRIVERS]);
    expect(coupling[0]!.driverId).toBe('hydrogen-to-steam');
    expect(coupling[0]!.partnerReasons).toEqual(['shares H2(g)', 'same phase: gas']);
    expect(coupling.map((c) => c.driverId)).not.toContain(THERMITE.id);
    expect(coupling[0]!.driverId).not.toBe(METHANE.id);
  });

  it('never burns the step’s feedstock: methane combustion is not offered for steam reforming', () => {
    const reforming = 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)';
    expect(fit(reforming, METHANE.equation).excluded).toMatch(/burns the step’s feedstock CH4\(g\)/);
    const { coupling } = single('CO(g)', { equation: reforming, temperature: '600 K' }, {}, [...DEFAULT_DRIVERS]);
    expect(coupling.map((c) => c.driverId)).not.toContain(METHANE.id);
    // Shares H2(g) and H2O(g), all gas: 2 + 2 + 1.
    expect(coupling[0]!.driverId).toBe('hydrogen-to-steam');
    expect(coupling[0]!.partnerScore).toBe(5);
  });

  it('leaves a solids-only thermite out beside a step with a gas, and keeps it for a solid-state step', () => {
    expect(fit('CaCO3(s) -> CaO(s) + CO2(g)', THERMITE.equation).excluded).toMatch(/all solids/);
    expect(single('CaO(s)', { equation: 'CaCO3(s) -> CaO(s) + CO2(g)' }, {}, [THERMITE]).coupling).toEqual([]);
    const solidState = fit('Fe2O3(s) + 3 Mg(s) -> 3 MgO(s) + 2 Fe(s)', THERMITE.equation);
    expect(solidState.excluded).toBeNull();
    expect(solidState.reasons[0]).toMatch(/^shares .*Fe2O3\(s\)/);
  });

  it('scores a species out of its stable state at the step temperature lower (steam at 298 K)', () => {
    const steam = fit('CaCO3(s) -> CaO(s) + CO2(g)', 'H2(g) + 1/2 O2(g) -> H2O(g)');
    const liquid = fit('CaCO3(s) -> CaO(s) + CO2(g)', 'H2(g) + 1/2 O2(g) -> H2O(l)');
    expect(steam.reasons).toContain('a species is not in its stable state at this temperature');
    expect(steam.score).toBe(0); // same phase (gas) +1, unstable −1
    expect(liquid.score).toBe(0); // liquid water is not a phase the step has
  });

  it('a shared species outranks a larger push: calcination takes a CO2-making partner before sulfur dioxide oxidation', () => {
    const { coupling } = single('CaO(s)', { equation: 'CaCO3(s) -> CaO(s) + CO2(g)' }, {}, [...DEFAULT_DRIVERS]);
    const ids = coupling.map((c) => c.driverId);
    expect(coupling[0]!.partnerReasons[0]).toBe('shares CO2(g)');
    expect(ids).toContain('sulfur-dioxide-oxidation');
    expect(ids.indexOf('sulfur-dioxide-oxidation')).toBeGreaterThan(0);
  });
});
