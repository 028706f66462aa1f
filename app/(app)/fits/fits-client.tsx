'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { can } from '@/lib/auth/permissions';
import { dataSetsQuery, savedFitQuery, savedFitsQuery } from '@/lib/queries/fits';
import { activeMembership, useProfile } from '@/lib/queries/me';
import { DataSetFormView } from './_components/data-set-form';
import { DataSetView } from './_components/data-set-view';
import { FitSummary } from './_components/fit-summary';
import { SpeciesFromFitForm } from './_components/species-from-fit-form';
import { VantHoffPlot } from './_components/vant-hoff-plot';

type Selection = { kind: 'new' } | { kind: 'set'; id: number } | { kind: 'fit'; id: number } | null;

function SavedFitView({ fitId, canEdit }: { fitId: number; canEdit: boolean }) {
  const fit = useQuery(savedFitQuery(fitId));
  if (fit.isPending) return <p role="status" className="text-sm text-ink-soft">Loading the fit…</p>;
  if (fit.isError) return <Notice tone="error" title="The fit could not be loaded">{fit.error.message}</Notice>;
  const f = fit.data;
  return (
    <section className="flex flex-col gap-3" aria-label={`Fit ${f.name}`}>
      <h2 className="text-lg font-semibold">
        Fit #{f.id} {f.name}
      </h2>
      <p className="text-sm text-ink-soft">
        {f.equation || 'Not linked to a reaction'} · from data set “{f.dataSetName}” as it was on {new Date(f.createdAt).toLocaleString()} · by {f.createdBy ?? '—'}
      </p>
      <VantHoffPlot analysis={f.analysis} />
      <FitSummary result={f.result} />
      {canEdit ? <SpeciesFromFitForm fitId={f.id} equation={f.equation} /> : null}
    </section>
  );
}

// Data sets and saved fits side by side with the one being worked on.
export function FitsClient() {
  const { data: profile } = useProfile();
  const canEdit = can(activeMembership(profile)?.role, 'fit.edit');
  const sets = useQuery(dataSetsQuery());
  const fits = useQuery(savedFitsQuery());
  const [selected, setSelected] = useState<Selection>(null);
  const item = (active: boolean) => `w-full rounded-md px-2 py-1 text-left text-sm ${active ? 'bg-pine-50 font-medium text-pine-700' : 'hover:bg-paper-deep'}`;

  if (sets.isPending || fits.isPending) return <p role="status" className="py-6 text-sm text-ink-soft">Loading data sets…</p>;
  if (sets.isError || fits.isError) return <Notice tone="error" title="Data sets could not be loaded">{(sets.error ?? fits.error)?.message}</Notice>;
  const isEmpty = sets.data.length === 0 && fits.data.length === 0;

  return (
    // minmax(0, …) tracks: wide content (a table, the plot) scrolls or shrinks inside its column, never the page.
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[16rem_minmax(0,1fr)]">
      <nav aria-label="Data sets and fits" className="flex min-w-0 flex-col gap-3">
        {canEdit ? <Button onClick={() => setSelected({ kind: 'new' })}>New data set</Button> : null}
        <div>
          <h2 className="mb-1 text-xs font-semibold uppercase text-ink-soft">Data sets</h2>
          {sets.data.length === 0 ? <p className="text-sm text-ink-soft">None yet.</p> : null}
          {sets.data.map((s) => (
            <button key={s.id} type="button" className={item(selected?.kind === 'set' && selected.id === s.id)} onClick={() => setSelected({ kind: 'set', id: s.id })}>
              {s.name}
              <span className="block text-xs text-ink-soft">
                {s.points.length} points · {s.fitCount} saved fit{s.fitCount === 1 ? '' : 's'}
              </span>
            </button>
          ))}
        </div>
        <div>
          <h2 className="mb-1 text-xs font-semibold uppercase text-ink-soft">Saved fits</h2>
          {fits.data.length === 0 ? <p className="text-sm text-ink-soft">None yet.</p> : null}
          {fits.data.map((f) => (
            <button key={f.id} type="button" className={item(selected?.kind === 'fit' && selected.id === f.id)} onClick={() => setSelected({ kind: 'fit', id: f.id })}>
              #{f.id} {f.name}
              <span className="block text-xs text-ink-soft">{f.equation || 'no reaction'}</span>
            </button>
          ))}
        </div>
      </nav>
      <div>
        {selected?.kind === 'new' ? <DataSetFormView onCreated={(s) => setSelected({ kind: 'set', id: s.id })} /> : null}
        {selected?.kind === 'set' ? <DataSetView key={selected.id} dataSetId={selected.id} canEdit={canEdit} /> : null}
        {selected?.kind === 'fit' ? <SavedFitView key={selected.id} fitId={selected.id} canEdit={canEdit} /> : null}
        {selected === null ? (
          <EmptyState title={isEmpty ? 'No data sets yet' : 'Pick a data set or a saved fit'}>
            {isEmpty
              ? canEdit
                ? 'Upload a CSV of K at several temperatures, paste a table or type the points; the van ’t Hoff fit gives ΔH° and ΔS°.'
                : 'Designers and leads add data sets; their fits appear here for the whole team.'
              : 'Its plot, fit and points open here.'}
          </EmptyState>
        ) : null}
      </div>
    </div>
  );
}
