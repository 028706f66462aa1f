import { formatNumber, speciesHref } from '@/components/tables/species-columns';
import Link from 'next/link';
import { ScrollRegion } from '@/components/tables/scroll-region';
import type { DuplicateChoice } from '@/lib/schemas/species';
import type { PreviewRowDto } from '@/lib/services/species/import-preview';

const CHECK_WORDS: Record<string, string> = {
  consistent: 'ΔfG° agrees with ΔfH° − TΔfS°',
  derived: 'ΔfG° derived from ΔfH° and S°',
  unchecked: 'not checked (no S° for an element)',
  inconsistent: 'ΔfG° disagrees with ΔfH° − TΔfS°',
};

/** Every row of the file with its problems, and for each duplicate the choice to skip it or override. */
export function ImportPreviewTable({ rows, choices, onChoice, disabled }: {
  rows: PreviewRowDto[];
  choices: Record<string, DuplicateChoice>;
  onChoice: (key: string, choice: DuplicateChoice) => void;
  disabled: boolean;
}) {
  return (
    // The table scrolls inside its own named region on a phone; `relative` keeps its sr-only text from widening the page.
    <ScrollRegion label="Rows of the uploaded file, checked" className="rounded-lg border border-paper-edge bg-white">
      <table className="w-full text-sm">
        <caption className="sr-only">Rows of the uploaded file, checked</caption>
        <thead className="bg-paper-deep text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2">Row</th>
            <th scope="col" className="px-3 py-2">Species</th>
            <th scope="col" className="px-3 py-2 text-right">ΔfH° kJ/mol</th>
            <th scope="col" className="px-3 py-2 text-right">ΔfG° kJ/mol</th>
            <th scope="col" className="px-3 py-2 text-right">S° J/(mol K)</th>
            <th scope="col" className="px-3 py-2">Check</th>
            <th scope="col" className="px-3 py-2">Already there?</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => {
            const problems = Object.entries(r.errors);
            return (
              <tr key={r.row} className={`border-t border-paper-edge align-top ${problems.length ? 'bg-uphill-bg/50' : ''}`}>
                <td className="px-3 py-2 tabular-nums">{r.row}</td>
                <td className="px-3 py-2">
                  <span className="font-medium">{r.key ?? (r.formula || '—')}</span> <span className="text-ink-soft">{r.name}</span>
                  {problems.length ? (
                    <ul className="mt-1 flex flex-col gap-0.5 text-xs text-uphill">
                      {problems.map(([field, message]) => <li key={field}><span className="font-semibold">Error ({field}):</span> {message}</li>)}
                    </ul>
                  ) : null}
                  {r.warnings.map((w) => <p key={w} className="mt-1 text-xs text-marginal">Note: {w}</p>)}
                </td>
                <td className="px-3 py-2 text-right tabular-nums">{formatNumber(r.dfH_kJ, 1)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatNumber(r.dfG_kJ, 1)}{r.dfGDerived ? <span className="block text-xs text-ink-faint">derived</span> : null}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatNumber(r.S_J_per_K, 2)}</td>
                <td className="px-3 py-2 text-xs text-ink-soft">
                  {r.consistency ? CHECK_WORDS[r.consistency] : '—'}
                  {r.consistencyDifference_kJ !== null ? <span className="block">difference {formatNumber(r.consistencyDifference_kJ, 1)} kJ/mol</span> : null}
                </td>
                <td className="px-3 py-2">
                  {r.duplicate && r.key ? (
                    <div className="flex flex-col gap-1">
                      <span className="text-xs">
                        <Link href={speciesHref(r.key)} className="text-pine-700 underline-offset-2 hover:underline">{r.duplicate.of === 'team' ? 'Your team’s' : 'Built-in'} {r.duplicate.name}</Link>
                        <span className="block text-ink-faint">ΔfG° {formatNumber(r.duplicate.dfG_kJ, 1)} kJ/mol, {r.duplicate.source}</span>
                      </span>
                      <label className="text-xs">
                        <span className="sr-only">What to do with row {r.row}</span>
                        <select value={choices[r.key] ?? ''} disabled={disabled} onChange={(e) => onChoice(r.key!, e.target.value as DuplicateChoice)} className="rounded border border-paper-edge bg-white px-1.5 py-0.5">
                          <option value="" disabled>Choose…</option>
                          <option value="skip">Skip this row</option>
                          <option value="override">{r.duplicate.of === 'team' ? 'Replace your team’s values' : 'Override the built-in for your team'}</option>
                        </select>
                      </label>
                    </div>
                  ) : (
                    <span className="text-xs text-ink-faint">new</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
