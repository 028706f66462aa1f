// Step two: what the engine makes of the structure before anything is saved: the drawing, name and formula, ΔfH°,
// S°, ΔfG° and Cp with σ, where they come from (library, the team's own, or an estimate with its method), and for an
// estimate every group it matched with that group's source.
import { FormulaText } from '@/components/chemistry/formula-text';
import { OriginMark } from '@/components/chemistry/origin-mark';
import { StructureImage } from '@/components/chemistry/structure-image';
import type { ResolvedSpecies } from '@/lib/services/species/resolve-species';
import { ScrollRegion } from '@/components/tables/scroll-region';

const fmt = (x: number | null | undefined, digits = 1) => (x === null || x === undefined || !Number.isFinite(x) ? '—' : x.toFixed(digits).replace('-', '−'));
const PHASE_WORD = { g: 'gas', l: 'liquid', s: 'solid', aq: 'aqueous' } as const;

/** A name a reader can use: the engine's, unless it is only the SMILES again. */
export function readableName(answer: Pick<ResolvedSpecies, 'name' | 'smiles'>): string | null {
  return answer.name && answer.name !== answer.smiles ? answer.name : null;
}

function Value({ term, value, sigma }: { term: string; value: string; sigma?: string }) {
  return (
    <div className="flex flex-col rounded border border-paper-edge bg-white px-2 py-1">
      <dt className="text-xs text-ink-soft">{term}</dt>
      <dd className="tabular-nums text-ink">
        {value}
        {sigma ? <span className="ml-1 text-xs text-ink-faint">± {sigma}</span> : null}
      </dd>
    </div>
  );
}

export function StructureEstimate({ answer }: { answer: ResolvedSpecies }) {
  const name = readableName(answer);
  const [lo, hi] = answer.cpRange_K;
  return (
    <section aria-label="What Stepwell knows of this structure" className="flex max-w-3xl flex-col gap-3" data-testid="structure-estimate">
      <div className="flex flex-wrap items-start gap-4">
        {answer.smiles ? <StructureImage smiles={answer.smiles} name={name ?? 'pasted structure'} formula={answer.formula} width={200} height={150} className="rounded border border-paper-edge bg-white" /> : null}
        <div className="flex min-w-0 flex-col gap-1 text-sm">
          <p className="break-words text-base font-semibold text-ink">{name ?? 'No name in our identifier list'}</p>
          <p>
            <FormulaText value={answer.formula} /> · {PHASE_WORD[answer.phase]} ({answer.phase})
          </p>
          <p className="break-all font-mono text-xs text-ink-soft">{answer.smiles}</p>
          <p className="break-all font-mono text-xs text-ink-faint">InChIKey {answer.inchikey}</p>
          <p>
            <OriginMark facts={{ origin: answer.origin, source: answer.source ?? null, method: answer.method ?? null, sigma_kJ: answer.sigma_dfG_kJ }} />
          </p>
        </div>
      </div>
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-4" aria-label="Values at 298.15 K and 1 bar">
        <Value term="ΔfH° (kJ/mol)" value={fmt(answer.dfH_kJ)} sigma={answer.sigma_dfH_kJ === null ? undefined : fmt(answer.sigma_dfH_kJ)} />
        <Value term="S° (J/(mol K))" value={fmt(answer.S_J_per_K)} />
        <Value term="ΔfG° (kJ/mol)" value={fmt(answer.dfG_kJ)} sigma={answer.sigma_dfG_kJ === null ? undefined : fmt(answer.sigma_dfG_kJ)} />
        <Value term={`Cp° (J/(mol K)), ${fmt(lo, 0)}–${fmt(hi, 0)} K`} value={fmt(answer.Cp_J_per_K)} />
      </dl>
      <p className="text-xs text-ink-soft">
        {answer.origin === 'estimated'
          ? `Estimated by ${answer.method}. σ is the method’s calibrated uncertainty${answer.confidence === 'low' ? '; this structure is in a class the method handles poorly (low confidence)' : ''}. Cp(T) is modelled from ${fmt(lo, 0)} to ${fmt(hi, 0)} K.`
          : `From ${answer.source}.`}
      </p>
      {answer.notes?.length ? (
        <ul className="list-disc pl-5 text-xs text-ink-soft" aria-label="Notes on the estimate">
          {answer.notes.map((n) => <li key={n}>{n}</li>)}
        </ul>
      ) : null}
      {answer.groups?.length ? <EstimateGroups groups={answer.groups} /> : null}
    </section>
  );
}

function EstimateGroups({ groups }: { groups: NonNullable<ResolvedSpecies['groups']> }) {
  return (
    // Long group names scroll inside a named region on a phone, never the page.
    <ScrollRegion label="Groups matched">
      <table className="w-full text-left text-xs" data-testid="estimate-groups">
        <caption className="mb-1 text-left text-sm font-semibold text-ink">Groups matched ({groups.length})</caption>
        <thead className="text-ink-soft">
          <tr>
            <th scope="col" className="py-1 pr-2 font-medium">Group</th>
            <th scope="col" className="py-1 pr-2 text-right font-medium">Count</th>
            <th scope="col" className="py-1 pr-2 text-right font-medium">ΔfH° each (kJ/mol)</th>
            <th scope="col" className="py-1 pr-2 text-right font-medium">S° each (J/(mol K))</th>
            <th scope="col" className="py-1 font-medium">Source</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-paper-edge">
          {groups.map((g, i) => (
            <tr key={`${g.label}-${i}`}>
              <td className="py-1 pr-2 font-mono">{g.label}</td>
              <td className="py-1 pr-2 text-right tabular-nums">{g.count}</td>
              <td className="py-1 pr-2 text-right tabular-nums">{'dH_kJ' in g ? fmt((g as { dH_kJ?: number }).dH_kJ, 2) : '—'}</td>
              <td className="py-1 pr-2 text-right tabular-nums">{'dS_J_per_K' in g ? fmt((g as { dS_J_per_K?: number }).dS_J_per_K, 2) : '—'}</td>
              <td className="py-1 text-ink-soft">{g.source}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
