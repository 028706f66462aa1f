'use client';

import { useQuery } from '@tanstack/react-query';
import { formatEnergy, type EnergyUnit } from '@/components/ladder/energy-format';
import { revisionCompareQuery } from '@/lib/queries/revisions';
import type { DeltaGChange, FieldValue } from '@/lib/services/revisions/revision-diff';

function show(value: FieldValue): string {
  if (value === null || value === '') return '—';
  if (typeof value === 'object') return `(${Math.round(value.x)}, ${Math.round(value.y)})`;
  return String(value);
}

function EnergyChange({ change, unit }: { change: DeltaGChange; unit: EnergyUnit }) {
  if (change.from === change.to) return <span className="text-ink-faint">ΔG unchanged</span>;
  return (
    <span className="tabular-nums">
      ΔG {formatEnergy(change.from, unit, { perMol: true })} → {formatEnergy(change.to, unit, { perMol: true })}
    </span>
  );
}

// Two revisions side by side: route fields, steps added, removed and changed (field by field, with ΔG), links.
export function RevisionDiffView({ routeId, from, to, unit }: { routeId: number; from: number; to: number; unit: EnergyUnit }) {
  const query = useQuery(revisionCompareQuery(routeId, from, to));
  if (query.isPending) return <p className="text-sm text-ink-faint">Comparing…</p>;
  if (query.isError) return <p role="alert" className="text-sm text-uphill">Could not compare: {query.error.message}</p>;
  const { diff, from: a, to: b } = query.data;
  const nothing = diff.route.length + diff.steps.added.length + diff.steps.removed.length + diff.steps.changed.length + diff.links.added.length + diff.links.removed.length === 0;
  return (
    <div className="flex flex-col gap-2 text-sm" aria-label={`Changes from revision ${a.version} to ${b.version}`}>
      <p className="font-medium">
        Revision {a.version} → {b.version}: overall <EnergyChange change={diff.overallDeltaG_kJ} unit={unit} />
      </p>
      {nothing ? <p className="text-ink-faint">The two revisions hold the same route.</p> : null}
      {diff.route.length ? (
        <ul className="list-disc pl-5">
          {diff.route.map((c) => (
            <li key={c.field}>
              {c.field}: {show(c.from)} → {show(c.to)}
            </li>
          ))}
        </ul>
      ) : null}
      {diff.steps.added.map((s) => (
        <p key={`+${s.id}`}>
          <span className="font-medium text-downhill">+ added</span> <span className="font-mono">{s.equation || 'blank step'}</span> ({s.id}), ΔG {formatEnergy(s.deltaG_kJ, unit, { perMol: true })}
        </p>
      ))}
      {diff.steps.removed.map((s) => (
        <p key={`-${s.id}`}>
          <span className="font-medium text-uphill">− removed</span> <span className="font-mono">{s.equation || 'blank step'}</span> ({s.id})
        </p>
      ))}
      {diff.steps.changed.length ? (
        <table className="w-full text-left text-xs">
          <caption className="sr-only">Changed steps</caption>
          <thead>
            <tr className="border-b border-paper-edge text-ink-soft">
              <th className="py-1 pr-2 font-medium">Step</th>
              <th className="py-1 pr-2 font-medium">Field</th>
              <th className="py-1 pr-2 font-medium">Before</th>
              <th className="py-1 font-medium">After</th>
            </tr>
          </thead>
          <tbody>
            {diff.steps.changed.map((s) => [
              ...s.fields.map((f, i) => (
                <tr key={`${s.id}-${f.field}`} className="align-top">
                  <td className="py-0.5 pr-2 font-mono">{i === 0 ? s.id : ''}</td>
                  <td className="py-0.5 pr-2">{f.field}</td>
                  <td className="py-0.5 pr-2 font-mono">{show(f.from)}</td>
                  <td className="py-0.5 font-mono">{show(f.to)}</td>
                </tr>
              )),
              <tr key={`${s.id}-dg`} className="border-b border-paper-deep">
                <td />
                <td colSpan={3} className="py-0.5 text-ink-soft">
                  <EnergyChange change={s.deltaG_kJ} unit={unit} />
                </td>
              </tr>,
            ])}
          </tbody>
        </table>
      ) : null}
      {diff.links.added.length + diff.links.removed.length ? (
        <p className="text-xs text-ink-soft">
          Links: {diff.links.added.map((l) => `+ ${l.from} → ${l.to} (${l.species})`).join(', ')}
          {diff.links.added.length && diff.links.removed.length ? '; ' : ''}
          {diff.links.removed.map((l) => `− ${l.from} → ${l.to} (${l.species})`).join(', ')}
        </p>
      ) : null}
    </div>
  );
}
