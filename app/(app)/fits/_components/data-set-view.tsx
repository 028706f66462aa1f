'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { apiFetch } from '@/lib/queries/api-fetch';
import { analysisQuery, dataSetQuery, fitKeys } from '@/lib/queries/fits';
import type { DataSetDto, FitDetailDto } from '@/lib/services/fits/fit-dto';
import { FitSummary } from './fit-summary';
import { PointExclusions } from './point-exclusions';
import { SpeciesFromFitForm } from './species-from-fit-form';
import { VantHoffPlot } from './vant-hoff-plot';

/** One data set: its plot and fit as it stands, left-out points with reasons, and saving the fit. */
export function DataSetView({ dataSetId, canEdit }: { dataSetId: number; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const set = useQuery(dataSetQuery(dataSetId));
  const analysis = useQuery({ ...analysisQuery(dataSetId, set.data?.version ?? 0), enabled: set.isSuccess });
  const [fitName, setFitName] = useState('');
  const exclusions = useMutation({
    mutationFn: (list: { index: number; reason: string }[]) => apiFetch<DataSetDto>(`/api/fits/data-sets/${dataSetId}/exclusions`, { method: 'PUT', body: { exclusions: list } }),
    onSuccess: (updated) => queryClient.setQueryData(fitKeys.dataSet(dataSetId), updated),
  });
  const save = useMutation({
    mutationFn: () => apiFetch<FitDetailDto>('/api/fits', { method: 'POST', body: { dataSetId, name: fitName.trim() } }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: fitKeys.saved() });
      void queryClient.invalidateQueries({ queryKey: fitKeys.dataSets() });
    },
  });

  if (set.isPending) return <p role="status" className="text-sm text-ink-soft">Loading the data set…</p>;
  if (set.isError) return <Notice tone="error" title="The data set could not be loaded">{set.error.message}</Notice>;
  const d = set.data;
  return (
    <section className="flex flex-col gap-4" aria-label={`Data set ${d.name}`}>
      <header>
        <h2 className="text-lg font-semibold">{d.name}</h2>
        <p className="text-sm text-ink-soft">
          {d.equation || 'Not linked to a reaction'} · T in {d.temperatureUnit === 'degC' ? '°C' : 'K'} · {d.valueKind === 'K' ? 'K' : 'ln K'} · {d.points.length} points
          {d.note ? ` · ${d.note}` : ''}
        </p>
      </header>
      {analysis.isPending ? <p role="status" className="text-sm text-ink-soft">Fitting…</p> : null}
      {analysis.isError ? <Notice tone="error" title="No fit">{analysis.error.message}</Notice> : null}
      {analysis.data ? (
        <>
          <VantHoffPlot analysis={analysis.data} />
          <FitSummary result={analysis.data.result} />
          {exclusions.isError ? <Notice tone="error">{exclusions.error.message}</Notice> : null}
          <PointExclusions points={analysis.data.points} canEdit={canEdit} isBusy={exclusions.isPending} onChange={(list) => exclusions.mutate(list)} />
          {canEdit ? (
            <form
              className="flex flex-wrap items-end gap-2"
              onSubmit={(e) => {
                e.preventDefault();
                if (fitName.trim()) save.mutate();
              }}
            >
              <TextField label="Save this fit as" value={fitName} onChange={(e) => setFitName(e.target.value)} error={save.isError ? save.error.message : undefined} />
              <Button type="submit" disabled={!fitName.trim() || save.isPending}>
                {save.isPending ? 'Saving…' : 'Save fit with its raw data'}
              </Button>
            </form>
          ) : null}
          {save.data ? (
            <>
              <Notice tone="success">Saved as fit #{save.data.id}. Route steps of {save.data.equation || 'its reaction'} can now use it.</Notice>
              <SpeciesFromFitForm fitId={save.data.id} equation={save.data.equation} />
            </>
          ) : null}
        </>
      ) : null}
    </section>
  );
}
