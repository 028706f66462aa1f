// Best value per metric row: worked examples from library reactions (NBS Tables 1982 ΔfG° at 298.15 K, from memory).
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { bestPerRow, type RankedRoute } from '@/lib/compare/best-values';
import { buildComparison } from '@/lib/compare/build-comparison';
import type { RouteMetrics } from '@/lib/compare/compare-types';
import { METRIC_ROWS } from '@/lib/compare/metric-rows';
import { CALCINATION, CARBON_BURN, NO2_DIMER, forComparison, oneStep, reformingThenShift } from './compare-fixtures';

const metrics = (over: Partial<RouteMetrics>): RouteMetrics => ({
  overallDeltaG_kJ: 0, overallDeltaG0_kJ: 0, stepCount: 1, uphillSteps: 0, marginalSteps: 0, errorSteps: 0,
  largestUphill_kJ: null, smallestDrivingForce_kJ: 10, temperatureMin_K: 298.15, temperatureMax_K: 298.15,
  driversNeeded: [], uncoupledUphillSteps: 0, openFlags: 0, unresolvedComments: 0, status: 'draft',
  updatedAt: '2026-12-01T09:00:00.000Z', updatedBy: 'Baptiste Osei', ...over,
});
const ranked = (id: number, over: Partial<RouteMetrics>, evaluated = true): RankedRoute => ({ id, evaluated, metrics: metrics(over) });

describe('best per row, from evaluated routes', () => {
  // Carbon burn −394.359, calcination +130.401, NO2 dimerisation −4.73 (marginal), reforming + shift +113.505.
  const burn = forComparison(oneStep('CO2(g)', CARBON_BURN), { id: 1, openFlags: 1 });
  const calcine = forComparison(oneStep('CO2(g)', CALCINATION), { id: 2, status: 'approved' });
  const dimer = forComparison(oneStep('N2O4(g)', NO2_DIMER), { id: 3, unresolvedComments: 4 });
  const chain = forComparison(reformingThenShift(), { id: 4 });
  const { best } = buildComparison([burn, calcine, dimer, chain], {}, nbsLookup);

  it('lowest overall ΔG and ΔG° is the carbon burn (−394.359 kJ per mol target)', () => {
    expect(best.overallDeltaG_kJ).toEqual([1]);
    expect(best.overallDeltaG0_kJ).toEqual([1]);
  });

  it('fewest steps, uphill and marginal steps are shared by the routes that tie', () => {
    expect(best.stepCount).toEqual([1, 2, 3]);
    expect(best.uphillSteps).toEqual([1, 3]);
    expect(best.marginalSteps).toEqual([1, 2, 4]);
  });

  it('a route without an uphill step beats any climb; the largest driving force wins its row', () => {
    expect(best.largestUphill_kJ).toEqual([1, 3]);
    expect(best.smallestDrivingForce_kJ).toEqual([1]); // 394.359 against 4.73, −130.401, −142.124
  });

  it('review counts: fewest open flags and unresolved comments; status: approved; unranked rows stay empty', () => {
    expect(best.openFlags).toEqual([2, 3, 4]);
    expect(best.unresolvedComments).toEqual([1, 2, 4]);
    expect(best.status).toEqual([2]);
    expect(best.temperatureSpan).toEqual([]);
    expect(best.updatedAt).toEqual([]);
    expect(best.updatedBy).toEqual([]);
  });

  it('has a best entry for every row of the table', () => {
    expect(Object.keys(best).sort()).toEqual(METRIC_ROWS.map((r) => r.key).sort());
  });
});

describe('best per row, edge cases', () => {
  it('treats values within the tie tolerance as ties', () => {
    const best = bestPerRow([ranked(1, { overallDeltaG_kJ: -50 }), ranked(2, { overallDeltaG_kJ: -50 + 1e-9 }), ranked(3, { overallDeltaG_kJ: -49.9 })]);
    expect(best.overallDeltaG_kJ).toEqual([1, 2]);
  });

  it('never gives an energy row to a route the engine refused, and gives nobody a row no route has a value for', () => {
    const best = bestPerRow([
      ranked(1, { overallDeltaG_kJ: null, smallestDrivingForce_kJ: null, largestUphill_kJ: null, uphillSteps: null }, false),
      ranked(2, { overallDeltaG_kJ: 12, smallestDrivingForce_kJ: null }),
    ]);
    expect(best.overallDeltaG_kJ).toEqual([2]);
    expect(best.largestUphill_kJ).toEqual([2]);
    expect(best.uphillSteps).toEqual([2]);
    expect(best.smallestDrivingForce_kJ).toEqual([]);
    expect(best.stepCount).toEqual([1, 2]); // counts are known for every route
  });

  it('ranks drivers only among routes whose every uphill step has a coupling remedy', () => {
    const best = bestPerRow([
      ranked(1, { uphillSteps: 2, driversNeeded: [], uncoupledUphillSteps: 2 }),
      ranked(2, { uphillSteps: 1, driversNeeded: ['Hydrogen combustion to liquid water', 'Carbon monoxide oxidation'], uncoupledUphillSteps: 0 }),
      ranked(3, { uphillSteps: 1, driversNeeded: ['Methane combustion to steam'], uncoupledUphillSteps: 0 }),
    ]);
    expect(best.driversNeeded).toEqual([3]);
  });

  it('gives status to nobody when no route is approved', () => {
    expect(bestPerRow([ranked(1, { status: 'draft' }), ranked(2, { status: 'in_review' })]).status).toEqual([]);
  });
});
