import { describe, expect, it } from 'vitest';
import { stepFingerprint } from '@/lib/services/comments/step-fingerprint';

const step = { equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', conditions: { temperature: '523 K', pressures: { 'CO(g)': '50 bar', 'H2(g)': '100 bar' } }, yieldPct: 80, notes: '' };

describe('stepFingerprint', () => {
  it('does not depend on the order of keys in the stored conditions', () => {
    const reordered = { ...step, conditions: { pressures: { 'H2(g)': '100 bar', 'CO(g)': '50 bar' }, temperature: '523 K' } };
    expect(stepFingerprint(reordered)).toBe(stepFingerprint(step));
  });

  it('changes with the equation, any condition, the yield or the notes', () => {
    const base = stepFingerprint(step);
    expect(stepFingerprint({ ...step, equation: 'CO(g) + 2 H2(g) -> CH3OH(l)' })).not.toBe(base);
    expect(stepFingerprint({ ...step, conditions: { ...step.conditions, temperature: '550 K' } })).not.toBe(base);
    expect(stepFingerprint({ ...step, conditions: { ...step.conditions, pressures: { 'CO(g)': '50 bar', 'H2(g)': '90 bar' } } })).not.toBe(base);
    expect(stepFingerprint({ ...step, yieldPct: 79 })).not.toBe(base);
    expect(stepFingerprint({ ...step, notes: 'check the catalyst' })).not.toBe(base);
  });

  it('treats an absent condition like one never set', () => {
    expect(stepFingerprint({ ...step, conditions: { ...step.conditions, totalPressure: undefined } })).toBe(stepFingerprint(step));
  });
});
