// The new-route dialog's target check: the balance check's answer for "X -> X" in words at the target field.
import { describe, expect, it } from 'vitest';
import { CreateRouteInput } from '@/lib/schemas/route';
import { targetProbe, targetProblem } from '@/lib/route-editor/target-check';

describe('new-route target check', () => {
  it('probes the target as an identity equation, and nothing for an empty field', () => {
    expect(targetProbe(' CH3OH(g) ')).toBe('CH3OH(g) -> CH3OH(g)');
    expect(targetProbe('')).toBeNull();
    expect(targetProbe('A(g) -> B(g)')).toBeNull();
  });

  it('says an unreadable or unknown target at the field, and nothing for a known one', () => {
    const parse = { error: { code: 'PARSE_ERROR', message: 'Unknown element symbol "Un" at position 0 in "Unobtainium(g) -> Unobtainium(g)"', position: 0 } };
    expect(targetProblem('Unobtainium(g)', parse)).toBe(
      'Unobtainium(g) cannot be read as a species: Unknown element symbol "Un". Write a formula or name with its phase, e.g. CH3OH(g) or ethanol(l).',
    );
    const unknown = { equation: 'CH3OHH(g) -> CH3OHH(g)', isBalanced: true, balanced: null, unknownSpecies: ['CH3OHH(g)'], message: 'Balanced, but CH3OHH(g) is not in the species library (closest: CH3OH(g)).' };
    expect(targetProblem('CH3OHH(g)', unknown)).toBe('CH3OHH(g) is not in the species library (closest: CH3OH(g)).');
    expect(targetProblem('CH3OH(g)', { equation: 'x', isBalanced: true, balanced: 'x', unknownSpecies: [], message: 'Balanced.' })).toBeNull();
    expect(targetProblem('CH3OH(g)', undefined)).toBeNull();
  });

  it('refuses an amount that is not an amount of substance, as people type', () => {
    const base = { name: 'Methanol', target: 'CH3OH(g)' };
    expect(CreateRouteInput.safeParse({ ...base, targetAmount: 'lots' }).success).toBe(false);
    expect(CreateRouteInput.safeParse({ ...base, targetAmount: '0 mol' }).success).toBe(false);
    expect(CreateRouteInput.safeParse({ ...base, targetAmount: '5' }).success).toBe(false);
    for (const ok of ['1 mol', '500 mmol', '2.5 kmol', '1e3 mol']) expect(CreateRouteInput.safeParse({ ...base, targetAmount: ok }).success, ok).toBe(true);
  });
});
