// K(T) of N2O4(g) ⇌ 2 NO2(g) made from the NBS 1982 values (Wagman et al.): ΔrH° = 57.20 kJ/mol, ΔrS° = 175.83 J/(mol K).
// Exact, not measured: the fit must give these numbers back.
import { R_GAS } from '@/lib/thermo/constants';

export const N2O4_EQUATION = 'N2O4(g) -> 2 NO2(g)';
export const N2O4_DH_KJ = 57.2;
export const N2O4_DS_J = 175.83;

export function n2o4Csv(temperatures = [280, 300, 320, 340, 360]): string {
  const rows = temperatures.map((T) => `${T},${Math.exp((-N2O4_DH_KJ * 1000) / (R_GAS * T) + N2O4_DS_J / R_GAS).toPrecision(17)}`);
  return ['T/K,K', ...rows].join('\n');
}

let n = 0;

export async function makeDataSet(teamId: number, userId: number, over: { equation?: string; text?: string } = {}) {
  const { createDataSet } = await import('@/lib/services/fits/create-data-set');
  return createDataSet({
    teamId, userId,
    input: { name: `N2O4 set ${(n += 1)}`, equation: over.equation ?? N2O4_EQUATION, temperatureUnit: 'K', valueKind: 'K', note: 'Kestrel Ridge notebook KR-7, p. 12', source: 'csv', text: over.text ?? n2o4Csv() },
  });
}

export async function makeFit(teamId: number, userId: number, over: { equation?: string } = {}) {
  const { saveFit } = await import('@/lib/services/fits/save-fit');
  const set = await makeDataSet(teamId, userId, over);
  return saveFit({ teamId, userId, input: { dataSetId: set.id, name: `N2O4 fit ${n}` } });
}
