'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { formulaPlain, isStructureKey } from '@/components/chemistry/formula-text';
import { ChemText } from '@/components/chemistry/chem-text';
import { formulaUnicode } from '@/components/chemistry/formula-unicode';
import { formatKelvin } from '@/lib/format/numbers';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { can } from '@/lib/auth/permissions';
import { ApiError } from '@/lib/queries/api-fetch';
import { activeMembership, useProfile } from '@/lib/queries/me';
import { speciesDetailQuery } from '@/lib/queries/species';
import type { SpeciesDetailDto } from '@/lib/services/species/get-species';
import { SeriesPlot } from '../_components/series-plot';
import { SpeciesIdentity } from '../_components/species-identity';
import { SpeciesValues } from '../_components/species-values';

export function SpeciesDetailClient({ speciesKey }: { speciesKey: string }) {
  const detail = useQuery(speciesDetailQuery(speciesKey));
  // The name is not known before the answer, and a structure key is never shown.
  const shown = isStructureKey(speciesKey) ? 'this species' : speciesKey;
  const { data: profile } = useProfile();
  const canEdit = can(activeMembership(profile)?.role, 'species.edit');
  if (detail.isPending) return <p className="py-6 text-sm text-ink-soft" role="status">Loading {shown}…</p>;
  if (detail.isError) {
    const missing = detail.error instanceof ApiError && detail.error.status === 404;
    return (
      <Notice tone="error" title={missing ? `No species ${shown}` : 'The species could not be loaded'}>
        {missing ? 'Neither the built-in library nor your team has it. ' : `${detail.error.message} `}
        <Link href="/species" className="underline">Back to the species list</Link>
      </Notice>
    );
  }
  return <SpeciesDetail detail={detail.data} canEdit={canEdit} />;
}

export function SpeciesDetail({ detail, canEdit }: { detail: SpeciesDetailDto; canEdit: boolean }) {
  const { team, builtin } = detail;
  const name = team?.name ?? builtin?.name ?? detail.key;
  // A structure key ("{InChIKey}(l)") is never shown; the name stands in.
  const label = formulaPlain(detail.key, { name });
  const lines = (label: string) => [
    { label, points: detail.series.points },
    ...(detail.builtinSeries ? [{ label: 'built-in values', points: detail.builtinSeries.points, dashed: true }] : []),
  ];
  const [lo, hi] = detail.series.range_K;
  return (
    <div className="flex flex-col gap-4">
      <PageHeader title={isStructureKey(detail.key) ? label : `${formulaUnicode(detail.key)} · ${name}`} lead={detail.inUse === 'team' ? 'Your team’s values are used in its evaluations.' : 'Built-in values from the library.'} />
      <SpeciesIdentity detail={detail} />
      <div className="flex flex-wrap items-center gap-3">
        <Link href="/species" className="text-sm text-pine-700 underline-offset-2 hover:underline">All species</Link>
        {team && canEdit ? (
          <Link href={`/species/team/${team.id}/edit`} className="rounded-md border border-paper-edge bg-white px-3 py-1.5 text-sm font-medium hover:bg-paper-deep">Edit team values</Link>
        ) : null}
      </div>
      <SpeciesValues team={team} builtin={builtin} />
      <section aria-labelledby="plots" className="flex flex-col gap-2">
        <h2 id="plots" className="text-base font-semibold">Over the data range ({formatKelvin(lo)}–{formatKelvin(hi)} K)</h2>
        <p className="text-sm text-ink-soft">
          {detail.series.cpBasis === 'nasa9' ? 'Cp° from the NASA Glenn polynomial.' : detail.series.cpBasis === 'constant' ? 'Cp° is one constant value over this range.' : detail.series.cpBasis === 'form' ? 'Cp° from the published Cp(T) form named in the sources (or the estimate’s fitted curve).' : 'No Cp° data: ΔfG°(T) takes ΔCp = 0.'}{' '}
          ΔfG°(T) is the formation reaction from the elements in their reference states, as the engine computes it.
        </p>
        <div className="grid gap-3 md:grid-cols-2">
          <SeriesPlot title="Cp°(T)" unit="J/(mol K)" value={(p) => p.Cp_J_per_K} lines={lines(detail.inUse === 'team' ? 'team values' : 'library')} />
          <SeriesPlot title="ΔfG°(T)" unit="kJ/mol" value={(p) => p.dfG_kJ} lines={lines(detail.inUse === 'team' ? 'team values' : 'library')} />
        </div>
      </section>
      <section aria-labelledby="uses" className="flex flex-col gap-2">
        <h2 id="uses" className="text-base font-semibold">Routes of your team that use it</h2>
        {detail.routes.length === 0 ? (
          <p className="text-sm text-ink-soft">No route of your team uses {label} yet.</p>
        ) : (
          <ul className="flex flex-col gap-1 text-sm">
            {detail.routes.map((r) => (
              <li key={r.routeId}>
                <Link href={`/routes/${r.routeId}`} className="font-medium text-pine-700 underline-offset-2 hover:underline">{r.routeName}</Link>
                {r.archived ? <span className="ml-1 rounded bg-paper-deep px-1 text-[11px] text-ink-faint">archived</span> : null}
                <span className="text-ink-soft"> — </span>
                {r.stepKeys.map((s, i) => (
                  <span key={s}>
                    {i ? ', ' : ''}
                    {/* People know a step by its place and what it does ("Step 3 (ethanol dehydrogenation)"), never by its key. */}
                    <Link href={`/routes/${r.routeId}?step=${encodeURIComponent(s)}`} className="text-pine-700 underline-offset-2 hover:underline">
                      <ChemText text={r.steps?.[i]?.label ?? `Step ${r.steps?.[i]?.number ?? i + 1}`} />
                    </Link>
                  </span>
                ))}
              </li>
            ))}
          </ul>
        )}
      </section>
      <p className="text-xs text-ink-faint">These values say whether a step can go and how far, not how fast: a thermodynamic screen says nothing of rates, runaway or toxicity.</p>
    </div>
  );
}
