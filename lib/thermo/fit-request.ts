// Runs a van 't Hoff fit request: reads the quantities, fits, and reports K at asked temperatures.
import type { FitRequest } from '../schemas/fit';
import { ThermoError } from './errors';
import { fitVantHoff, kAtTemperature, type FitPoint, type KValue, type VantHoffFit } from './fit';
import { parseTemperature } from './units';

export interface FitResponse extends VantHoffFit {
  predictions: (KValue & { temperature_K: number })[];
}

function toPoint(p: FitRequest['points'][number], i: number): FitPoint {
  const field = `points.${i}`;
  const temperature_K = parseTemperature(p.temperature, `${field}.temperature`);
  let lnK: number;
  if (p.K !== undefined) {
    if (!(p.K > 0)) {
      throw new ThermoError('INVALID_VALUE', `${field}.K must be greater than 0 (got ${p.K})`, { field: `${field}.K` });
    }
    lnK = Math.log(p.K);
  } else if (p.log10K !== undefined) {
    lnK = p.log10K * Math.LN10;
  } else if (p.lnK !== undefined) {
    lnK = p.lnK;
  } else {
    throw new ThermoError('INVALID_VALUE', `${field}: give one of K, lnK, log10K`, { field });
  }
  return { temperature_K, lnK, sigma_lnK: p.sigma_lnK };
}

export function runFit(request: FitRequest): FitResponse {
  const fit = fitVantHoff(request.points.map(toPoint));
  const predictions = (request.predictAt ?? []).map((t, i) => {
    const temperature_K = parseTemperature(t, `predictAt.${i}`);
    return { temperature_K, ...kAtTemperature({ deltaH0_kJ: fit.deltaH0_kJ, deltaS0_J_per_K: fit.deltaS0_J_per_K, temperature_K }) };
  });
  return { ...fit, predictions };
}
