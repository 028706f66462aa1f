import { queryOptions } from '@tanstack/react-query';
import type { FitAnalysis } from '../fits/analyse-fit';
import type { DataSetDto, FitDetailDto, FitSummaryDto } from '../services/fits/fit-dto';
import { apiFetch } from './api-fetch';

export const fitKeys = {
  all: () => ['fits'] as const,
  dataSets: () => ['fits', 'data-sets'] as const,
  dataSet: (id: number) => ['fits', 'data-sets', id] as const,
  analysis: (id: number, version: number) => ['fits', 'data-sets', id, 'analysis', version] as const,
  saved: () => ['fits', 'saved'] as const,
  fit: (id: number) => ['fits', 'saved', id] as const,
};

export const dataSetsQuery = () =>
  queryOptions({ queryKey: fitKeys.dataSets(), queryFn: () => apiFetch<{ dataSets: DataSetDto[] }>('/api/fits/data-sets').then((r) => r.dataSets) });

export const dataSetQuery = (id: number) => queryOptions({ queryKey: fitKeys.dataSet(id), queryFn: () => apiFetch<DataSetDto>(`/api/fits/data-sets/${id}`) });

// Keyed by the set's version, so an edit or an exclusion fetches a fresh fit and the old one is never shown for new data.
export const analysisQuery = (id: number, version: number) =>
  queryOptions({ queryKey: fitKeys.analysis(id, version), queryFn: () => apiFetch<FitAnalysis>(`/api/fits/data-sets/${id}/analysis`), retry: false });

export const savedFitsQuery = () => queryOptions({ queryKey: fitKeys.saved(), queryFn: () => apiFetch<{ fits: FitSummaryDto[] }>('/api/fits').then((r) => r.fits) });

export const savedFitQuery = (id: number) =>
  queryOptions({ queryKey: fitKeys.fit(id), queryFn: () => apiFetch<FitDetailDto & { analysis: FitAnalysis }>(`/api/fits/${id}`) });
