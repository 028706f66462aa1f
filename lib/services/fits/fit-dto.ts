import 'server-only';
import type { Fit, FitRawData } from '../../../db/models/fit';
import type { FitDataSet } from '../../../db/models/fit-data-set';
import type { FitResult } from '../../fits/analyse-fit';
import type { StoredPoint, TemperatureUnit, ValueKind } from '../../schemas/fit-data';

export interface DataSetDto {
  id: number;
  name: string;
  equation: string;
  temperatureUnit: TemperatureUnit;
  valueKind: ValueKind;
  source: 'csv' | 'paste' | 'grid';
  note: string;
  points: StoredPoint[];
  version: number;
  fitCount: number;
  updatedAt: string;
  updatedBy: string | null;
}

export interface FitSummaryDto {
  id: number;
  name: string;
  equation: string;
  dataSetId: number | null;
  dataSetName: string;
  result: FitResult;
  createdAt: string;
  createdBy: string | null;
}

export interface FitDetailDto extends FitSummaryDto {
  rawData: FitRawData;
}

export function toDataSetDto(row: FitDataSet, fitCount: number): DataSetDto {
  const by = row.get('updatedBy') as { name: string } | null | undefined;
  return {
    id: row.id,
    name: row.name,
    equation: row.equation,
    temperatureUnit: row.temperatureUnit,
    valueKind: row.valueKind,
    source: row.source,
    note: row.note,
    points: row.points,
    version: row.version,
    fitCount,
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: by?.name ?? null,
  };
}

export function toFitSummary(row: Fit): FitSummaryDto {
  const by = row.get('createdBy') as { name: string } | null | undefined;
  return {
    id: row.id,
    name: row.name,
    equation: row.equation,
    dataSetId: row.dataSetId,
    dataSetName: row.rawData.dataSetName,
    result: row.result,
    createdAt: row.createdAt.toISOString(),
    createdBy: by?.name ?? null,
  };
}

export function toFitDetail(row: Fit): FitDetailDto {
  return { ...toFitSummary(row), rawData: row.rawData };
}

