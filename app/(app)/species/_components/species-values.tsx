import { formatNumber } from '@/components/tables/species-columns';
import { formatSignificant } from '@/lib/format/numbers';
import type { TeamSpeciesDto } from '@/lib/services/species/species-dto';
import type { SpeciesRecord } from '@/lib/thermo/species-types';
import { withTrueMinus } from '@/lib/format/numbers';

// An uncertainty to two significant figures ("± 0.04", "± 2"): its own size, not the value's decimals.
const sigma = (x: number | null) => (x === null ? <span className="text-ink-faint">none published</span> : <>± {formatSignificant(x, 2)}</>);
// kJ/mol to 0.1, J/(mol K) to 0.01.
const decimals = (unit: string) => (unit.startsWith('kJ') ? 1 : 2);

export function provenanceText(team: TeamSpeciesDto): string {
  const p = team.provenance;
  if (p.kind === 'citation') return `Cited: ${p.citation}`;
  if (p.kind === 'measured') return `Measured: ${p.reference}${p.fitId ? ` (fit #${p.fitId})` : ''}`;
  return `Estimated by ${p.method}`;
}

/** Every value with its uncertainty and source; the built-in column stays beside a team override. */
export function SpeciesValues({ team, builtin }: { team: TeamSpeciesDto | null; builtin: SpeciesRecord | null }) {
  const rows: { label: string; unit: string; team?: [number | null, number | null]; builtin?: [number | null, number | null]; note?: string }[] = [
    { label: 'ΔfH°', unit: 'kJ/mol', team: team ? [team.dfH_kJ, team.sigmaDfH_kJ] : undefined, builtin: builtin ? [builtin.dfH_kJ, builtin.uncertainty.dfH_kJ] : undefined },
    {
      label: 'ΔfG°', unit: 'kJ/mol', team: team ? [team.dfG_kJ, team.sigmaDfG_kJ] : undefined, builtin: builtin ? [builtin.dfG_kJ, builtin.uncertainty.dfG_kJ] : undefined,
      note: team?.dfGDerived ? 'team value derived from ΔfH° and S°' : builtin?.flags.includes('dfGDerived') && !team ? 'derived from ΔfH° and S°' : undefined,
    },
    { label: 'S°', unit: 'J/(mol K)', team: team ? [team.S_J_per_K, team.sigmaS_J_per_K] : undefined, builtin: builtin ? [builtin.S_J_per_K, builtin.uncertainty.S_J_per_K] : undefined },
    { label: 'Cp°', unit: 'J/(mol K)', team: team ? [team.Cp_J_per_K, null] : undefined, builtin: builtin ? [builtin.Cp_J_per_K, null] : undefined },
  ];
  return (
    <section aria-labelledby="values" className="flex flex-col gap-2">
      <h2 id="values" className="text-base font-semibold">Values at 298.15 K and 1 bar</h2>
      <div className="overflow-x-auto rounded-lg border border-paper-edge bg-white">
        <table className="w-full text-sm">
          <caption className="sr-only">Standard values with uncertainty</caption>
          <thead className="bg-paper-deep text-left text-xs text-ink-soft">
            <tr>
              <th scope="col" className="px-3 py-2">Quantity</th>
              {team ? <th scope="col" className="px-3 py-2 text-right">Team value</th> : null}
              {team ? <th scope="col" className="px-3 py-2">σ</th> : null}
              {builtin ? <th scope="col" className="px-3 py-2 text-right">{team ? 'Built-in (not used)' : 'Built-in value'}</th> : null}
              {builtin ? <th scope="col" className="px-3 py-2">σ</th> : null}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.label} className="border-t border-paper-edge">
                <th scope="row" className="px-3 py-2 text-left font-medium">{r.label} <span className="font-normal text-ink-faint">{r.unit}</span>{r.note ? <span className="block text-xs font-normal text-ink-faint">{r.note}</span> : null}</th>
                {r.team ? <td className="px-3 py-2 text-right tabular-nums">{formatNumber(r.team[0], decimals(r.unit))}</td> : null}
                {r.team ? <td className="px-3 py-2">{r.label === 'Cp°' ? '' : sigma(r.team[1])}</td> : null}
                {r.builtin ? <td className={`px-3 py-2 text-right tabular-nums ${team ? 'text-ink-faint' : ''}`}>{formatNumber(r.builtin[0], decimals(r.unit))}</td> : null}
                {r.builtin ? <td className="px-3 py-2">{r.label === 'Cp°' ? '' : sigma(r.builtin[1])}</td> : null}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <dl className="grid gap-1 text-sm sm:grid-cols-[10rem_1fr]">
        {team ? (
          <>
            <dt className="text-ink-soft">Team source</dt>
            <dd>{provenanceText(team)} <span className="text-ink-faint">(version {team.version}{team.updatedBy ? `, saved by ${team.updatedBy}` : ''}{team.importId ? `, import #${team.importId}` : ''})</span></dd>
          </>
        ) : null}
        {builtin ? (
          <>
            <dt className="text-ink-soft">Built-in source</dt>
            <dd>
              {withTrueMinus(builtin.source)} <span className="text-ink-faint">({builtin.sourceRef})</span>
              {builtin.flags.includes('fromMemory') ? <span className="ml-1 text-marginal">from memory, not yet checked against the printed source</span> : null}
              {builtin.uncertaintyRef ? <span className="block text-xs text-ink-faint">Uncertainty: {builtin.uncertaintyRef}</span> : null}
              {builtin.compilationDifference ? (
                <span className="block text-xs text-ink-faint">
                  |ΔfH°| differs by {formatNumber(builtin.compilationDifference.dfH_kJ, 1)} kJ/mol from {builtin.compilationDifference.against}; the engine uses that spread as σ where nothing is published.
                </span>
              ) : null}
            </dd>
          </>
        ) : null}
        {team?.notes ? (
          <>
            <dt className="text-ink-soft">Notes</dt>
            <dd className="whitespace-pre-wrap">{team.notes}</dd>
          </>
        ) : null}
      </dl>
    </section>
  );
}
