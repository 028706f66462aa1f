'use client';

import { useQuery } from '@tanstack/react-query';
import { ChemText } from '@/components/chemistry/chem-text';
import { FormulaText } from '@/components/chemistry/formula-text';
import { formatEnergy, type EnergyUnit } from '@/components/ladder/energy-format';
import { formatKJ, readableTyped } from '@/lib/format/numbers';
import { revisionCompareQuery } from '@/lib/queries/revisions';
import type { DeltaGChange, FieldValue } from '@/lib/services/revisions/revision-diff';

function show(value: FieldValue): string {
  if (value === null || value === '') return '—';
  if (typeof value === 'boolean') return value ? 'on' : 'off';
  if (typeof value === 'object') return `(${Math.round(value.x)}, ${Math.round(value.y)})`;
  return readableTyped(String(value));
}

// Field names as people say them; a condition map's entry ("pressures.CO(g)") reads "p(CO(g))".
const FIELD_NAMES: Record<string, string> = {
  name: 'Name',
  target: 'Target',
  targetAmount: 'Target amount',
  marginalThreshold_kJ: 'Marginal threshold (kJ/mol)',
  equation: 'Equation',
  temperature: 'Temperature',
  standardPressure: 'Standard state',
  heatCapacity: 'Cp correction',
  totalPressure: 'Total pressure',
  electrons: 'Electrons',
  yieldPct: 'Yield (%)',
  notes: 'Notes',
  position: 'Place on the board',
};
const MAP_NAMES: Record<string, string> = { pressures: 'p', concentrations: 'c', initial: 'initial' };

function fieldName(field: string): string {
  const dot = field.indexOf('.');
  if (dot > 0) return `${MAP_NAMES[field.slice(0, dot)] ?? field.slice(0, dot)}(${field.slice(dot + 1)})`;
  return FIELD_NAMES[field] ?? field;
}

function Value({ field, value }: { field: string; value: FieldValue }) {
  if (field === 'marginalThreshold_kJ' && typeof value === 'number') return <>{formatKJ(value)}</>;
  if (typeof value === 'string' && (field === 'equation' || field === 'target')) return <ChemText text={show(value)} />;
  return <>{show(value)}</>;
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
  const { diff, from: a, to: b, stepLabels } = query.data;
  const label = (id: string) => stepLabels?.[id] ?? 'a step';
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
              {fieldName(c.field)}: <Value field={c.field} value={c.from} /> → <Value field={c.field} value={c.to} />
            </li>
          ))}
        </ul>
      ) : null}
      {diff.steps.added.map((s) => (
        <p key={`+${s.id}`}>
          <span className="font-medium text-downhill">+ added</span> <ChemText text={label(s.id)} />: <ChemText text={s.equation || 'blank step'} />, ΔG {formatEnergy(s.deltaG_kJ, unit, { perMol: true })}
        </p>
      ))}
      {diff.steps.removed.map((s) => (
        <p key={`-${s.id}`}>
          <span className="font-medium text-uphill">− removed</span> <ChemText text={label(s.id)} />: <ChemText text={s.equation || 'blank step'} />
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
                  <td className="py-0.5 pr-2">{i === 0 ? <ChemText text={label(s.id)} /> : ''}</td>
                  <td className="py-0.5 pr-2">{fieldName(f.field).includes('(') ? <ChemText text={fieldName(f.field)} /> : fieldName(f.field)}</td>
                  <td className="py-0.5 pr-2">
                    <Value field={f.field} value={f.from} />
                  </td>
                  <td className="py-0.5">
                    <Value field={f.field} value={f.to} />
                  </td>
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
        <ul className="text-xs text-ink-soft" aria-label="Links changed">
          {diff.links.added.map((l) => (
            <li key={`+${l.from}>${l.to}:${l.species}`}>
              + link <FormulaText value={l.species} /> from <ChemText text={label(l.from)} /> to <ChemText text={label(l.to)} />
            </li>
          ))}
          {diff.links.removed.map((l) => (
            <li key={`-${l.from}>${l.to}:${l.species}`}>
              − link <FormulaText value={l.species} /> from <ChemText text={label(l.from)} /> to <ChemText text={label(l.to)} />
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
