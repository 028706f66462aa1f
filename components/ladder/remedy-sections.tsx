// One section per remedy kind, kept compact: the best remedy of the kind with its sentence, the figure that matters
// and the action button; the other figures and the other remedies of the kind wait behind "more" buttons.
import type { ReactNode } from 'react';
import type { ConditionMapsOut, ConditionsRemedy, CouplingRemedy, TemperatureRemedy } from '@/lib/thermo/route';
import { ChemText } from '@/components/chemistry/chem-text';
import { Button } from '@/components/ui/button';
import { formatEnergy, formatFold, formatNumber, formatTemperature, type EnergyUnit, type TemperatureUnit } from './energy-format';
import { RemedyDisclosure } from './remedy-disclosure';
import { conditionsActionText, lnQExponent, sampleDeltaG, samplesAround, warningWords, SAMPLE_OFFSET_K } from './remedy-groups';

export const COUPLING_NOTE = 'Coupling is bookkeeping: the two reactions need a real shared mechanism or intermediate.';

export interface Units {
  energy: EnergyUnit;
  temperature: TemperatureUnit;
}

type Fact = readonly [term: string, value: ReactNode];

function Facts({ rows }: { rows: readonly (Fact | null)[] }) {
  return (
    <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-xs">
      {rows.filter((r): r is Fact => r !== null).map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-ink-faint">{term}</dt>
          <dd className="tabular-nums text-ink">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

function Card({ children }: { children: ReactNode }) {
  return <li className="rounded-md border border-paper-edge bg-white p-3">{children}</li>;
}

/** The figures behind a remedy's sentence, one click away. */
function MoreFigures({ rows }: { rows: readonly (Fact | null)[] }) {
  return (
    <RemedyDisclosure label="Figures" openLabel="Hide figures" className="mt-1">
      <Facts rows={rows} />
    </RemedyDisclosure>
  );
}

/** The first item of a kind shows; the rest wait behind one button ("2 more drivers"). */
function FirstAndMore<T>({ items, render, noun }: { items: readonly T[]; render: (item: T, i: number) => ReactNode; noun: [one: string, many: string] }) {
  const rest = items.slice(1);
  return (
    <>
      <ul className="flex flex-col gap-2">{items.slice(0, 1).map((item, i) => render(item, i))}</ul>
      {rest.length > 0 ? (
        <RemedyDisclosure label={`${rest.length} more ${rest.length === 1 ? noun[0] : noun[1]}`} openLabel={`Fewer ${noun[1]}`}>
          <ul className="flex flex-col gap-2">{rest.map((item, i) => render(item, i + 1))}</ul>
        </RemedyDisclosure>
      ) : null}
    </>
  );
}

function Cautions({ words }: { words: string[] }) {
  if (words.length === 0) return null;
  return <p className="mt-2 text-xs text-brass-700">⚠ Engine warns: {words.join('; ')}</p>;
}

const goalText = (goal_kJ: number, unit: EnergyUnit): string => (goal_kJ === 0 ? 'below 0' : `below ${formatEnergy(goal_kJ, unit, { perMol: true })}`);

export function TemperatureSection({ remedies, units, canEdit, onApply }: { remedies: TemperatureRemedy[]; units: Units; canEdit: boolean; onApply: (T_K: number) => void }) {
  const t = (K: number | null | undefined) => formatTemperature(K, units.temperature);
  const e = (kJ: number | null | undefined) => formatEnergy(kJ, units.energy, { perMol: true });
  return (
    <ul className="flex flex-col gap-2">
      {remedies.map((r, i) => {
        const around = samplesAround(r);
        const sampleText = (s: typeof around.below) => {
          if (!s) return 'outside the data range';
          const g = sampleDeltaG(s);
          return `${e(g.value_kJ)}${g.isStandard ? ' (ΔG°)' : ''} at ${t(s.T_K)}`;
        };
        const way = r.direction === 'raise' ? '↑ Raise' : r.direction === 'lower' ? '↓ Lower' : 'No temperature in the data range';
        return (
          <Card key={i}>
            <p className="text-sm text-ink">
              <ChemText text={r.summary} />
            </p>
            <Facts
              rows={[
                r.suggested_K === null ? null : ['Suggested', `${t(r.suggested_K)}, ΔG ${e(r.suggestedDeltaG_kJ)}`],
                ['Goal', `ΔG ${goalText(r.goal_kJ, units.energy)} (downhill)`],
              ]}
            />
            <MoreFigures
              rows={[
                ['Which way', r.direction ? `${way} the temperature (now ${t(r.current_K)})` : way],
                ['ΔG° = 0 at', r.crossover_K === null ? 'no crossover in the data range' : t(r.crossover_K)],
                r.target_K === null ? null : ['Goal reached at', t(r.target_K)],
                [`${SAMPLE_OFFSET_K} K lower`, sampleText(around.below)],
                [`${SAMPLE_OFFSET_K} K higher`, sampleText(around.above)],
                r.dataRange_K ? ['Data range', `${t(r.dataRange_K[0])} – ${t(r.dataRange_K[1])}`] : null,
              ]}
            />
            <Cautions words={warningWords(r.warningsAtSuggested)} />
            {canEdit && r.suggested_K !== null ? (
              <Button variant="secondary" className="mt-2" onClick={() => onApply(r.suggested_K!)}>
                Use this temperature ({t(r.suggested_K)})
              </Button>
            ) : null}
          </Card>
        );
      })}
    </ul>
  );
}

const FACTOR_TERM: Partial<Record<string, string>> = {
  'reactant-excess': 'Excess',
  'product-pressure': 'Reduction',
  'remove-product': 'Reduction',
  'out-of-reach': 'Q must fall',
};

function conditionValue(r: ConditionsRemedy): string | null {
  if (r.value === null || r.unit === null || !r.species) return null;
  const what = r.unit === 'bar' ? `p(${r.species})` : `c(${r.species})`;
  const bound = r.action === 'reactant-excess' ? '=' : '≤';
  return `${what} ${bound} ${formatNumber(r.value)} ${r.unit}`;
}

function PowerOfTen({ exponent }: { exponent: string | null }) {
  if (exponent === null) return <>—</>;
  return (
    <span className="whitespace-nowrap tabular-nums">
      10<sup>{exponent}</sup>
    </span>
  );
}

function hasConditions(c: ConditionMapsOut | null | undefined): c is ConditionMapsOut {
  return !!c && (Object.keys(c.pressures ?? {}).length > 0 || Object.keys(c.concentrations ?? {}).length > 0);
}

export function ConditionsSection({
  remedies,
  units,
  canEdit,
  onApply,
}: {
  remedies: ConditionsRemedy[];
  units: Units;
  canEdit: boolean;
  onApply: (patch: ConditionMapsOut) => void;
}) {
  const first = remedies[0];
  return (
    <div className="flex flex-col gap-2">
      {first && lnQExponent(first.lnQ_max) !== null ? (
        <p className="text-xs text-ink-soft">
          Largest reaction quotient that still works: Q below <PowerOfTen exponent={lnQExponent(first.lnQ_max)} /> (now{' '}
          <PowerOfTen exponent={lnQExponent(first.lnQ_current)} />
          ).
        </p>
      ) : null}
      <FirstAndMore
        items={remedies}
        noun={['way', 'ways']}
        render={(r, i) => (
          <Card key={i}>
            <p className="text-xs font-semibold uppercase tracking-wide text-ink-soft">{conditionsActionText(r.action)}</p>
            <p className="mt-1 text-sm text-ink">
              <ChemText text={r.summary} />
            </p>
            <Facts rows={[conditionValue(r) ? ['Change', <ChemText text={conditionValue(r)!} />] : null]} />
            <MoreFigures
              rows={[
                r.factor === null ? null : [FACTOR_TERM[r.action] ?? 'Factor', formatFold(r.factor)],
                r.activity_current === null || r.activity_target === null
                  ? null
                  : ['Activity', `${formatNumber(r.activity_current)} → ${formatNumber(r.activity_target)}`],
                r.checkedDeltaG_kJ === null ? null : ['ΔG with this change', formatEnergy(r.checkedDeltaG_kJ, units.energy, { perMol: true })],
              ]}
            />
            {canEdit && hasConditions(r.conditions) ? (
              <Button variant="secondary" className="mt-2" onClick={() => onApply(r.conditions!)}>
                Apply these conditions
              </Button>
            ) : null}
          </Card>
        )}
      />
    </div>
  );
}

// The engine ranks drivers by how plausible a partner each is for the step (shared species, same phase, stable
// states); the first shows, the rest wait behind "more".

function CouplingCard({ r, units, canEdit, onAdd }: { r: CouplingRemedy; units: Units; canEdit: boolean; onAdd: (remedy: CouplingRemedy) => void }) {
  const e = (kJ: number | null | undefined) => formatEnergy(kJ, units.energy, { perMol: true });
  return (
    <Card>
      <p className="text-sm font-semibold text-ink">
        {formatNumber(r.multiple)} × {r.driverName}
      </p>
      {r.partnerReasons?.length ? <p className="text-xs text-ink-soft">Why this partner: {r.partnerReasons.join('; ')}</p> : null}
      <Facts
        rows={[
          ['Combined', <ChemText className="break-words" text={r.combinedEquation} />],
          ['Combined ΔG', e(r.combinedDeltaG_kJ)],
        ]}
      />
      <MoreFigures
        rows={[
          ['Driver', <ChemText text={r.driverEquation} />],
          ['Driver ΔG°', e(r.driverDeltaG0_kJ)],
          ['Multiple', `× ${formatNumber(r.multiple)} (at least × ${formatNumber(r.exactMultiple)})`],
          ['Step ΔG', e(r.stepDeltaG_kJ)],
        ]}
      />
      <Cautions words={warningWords(r.warnings)} />
      {canEdit ? (
        <Button variant="secondary" className="mt-2" onClick={() => onAdd(r)}>
          Apply coupling to this step
        </Button>
      ) : null}
    </Card>
  );
}

export function CouplingSection({
  remedies,
  units,
  canEdit,
  onAdd,
}: {
  remedies: CouplingRemedy[];
  units: Units;
  canEdit: boolean;
  onAdd: (remedy: CouplingRemedy) => void;
}) {
  const card = (r: CouplingRemedy, i: number) => <CouplingCard key={`${r.driverId}-${i}`} r={r} units={units} canEdit={canEdit} onAdd={onAdd} />;
  return (
    <div className="flex flex-col gap-2">
      <p className="rounded-md border border-brass-500/40 bg-brass-100 px-3 py-2 text-xs text-brass-700">{COUPLING_NOTE}</p>
      <FirstAndMore items={remedies} render={card} noun={['driver', 'drivers']} />
    </div>
  );
}
