'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { FormulaText, formulaPlain } from '@/components/chemistry/formula-text';
import { OriginMark } from '@/components/chemistry/origin-mark';
import { formatFixed } from '@/lib/format/numbers';
import type { SpeciesRowDto } from '@/lib/services/species/species-dto';
import { withTrueMinus } from '@/lib/format/numbers';

export const PHASE_WORDS: Record<string, string> = { g: 'gas', l: 'liquid', s: 'solid', aq: 'aqueous' };

/** Table values to a fixed precision with the true minus (lib/format): kJ/mol to 0.1, J/(mol K) to 0.01. */
export function formatNumber(x: number | null | undefined, digits = 2): string {
  return formatFixed(x, digits);
}

export const speciesHref = (key: string) => `/species/${encodeURIComponent(key)}`;

/** Built-in or the team's: the origin mark (glyph and word, source in its title), plus whether one replaces the other. */
export function OriginBadge({ row }: { row: Pick<SpeciesRowDto, 'origin' | 'overridesBuiltin' | 'shadowedByTeam'> & { source?: string } }) {
  return (
    <span className="flex flex-col items-start gap-0.5">
      <OriginMark facts={{ origin: row.origin, source: row.source ?? null }} />
      {row.origin === 'team' && row.overridesBuiltin ? <span className="text-xs font-medium text-marginal">overrides built-in</span> : null}
      {row.origin === 'library' && row.shadowedByTeam ? <span className="text-xs text-ink-faint">replaced by your team’s</span> : null}
    </span>
  );
}

// Paged and ordered by formula on the server, so no column sorts here.
export function speciesColumns(): ColumnDef<SpeciesRowDto>[] {
  return [
    {
      id: 'formula',
      header: 'Formula',
      enableSorting: false,
      cell: ({ row }) => (
        <Link
          href={speciesHref(row.original.key)}
          className="font-medium text-pine-700 underline-offset-2 hover:underline"
          aria-label={`${formulaPlain(row.original.key, { name: row.original.name })}: values, plot and routes`}
        >
          <FormulaText value={row.original.key} formula={row.original.formula} />
        </Link>
      ),
    },
    { id: 'name', header: 'Name', enableSorting: false, cell: ({ row }) => row.original.name },
    { id: 'phase', header: 'Phase', enableSorting: false, cell: ({ row }) => row.original.form ?? PHASE_WORDS[row.original.phase] ?? row.original.phase },
    { id: 'dfH', header: 'ΔfH° kJ/mol', enableSorting: false, cell: ({ row }) => formatNumber(row.original.dfH_kJ, 1) },
    { id: 'dfG', header: 'ΔfG° kJ/mol', enableSorting: false, cell: ({ row }) => formatNumber(row.original.dfG_kJ, 1) },
    { id: 'S', header: 'S° J/(mol K)', enableSorting: false, cell: ({ row }) => formatNumber(row.original.S_J_per_K) },
    { id: 'source', header: 'Source', enableSorting: false, cell: ({ row }) => <span className="line-clamp-2 max-w-64 text-ink-soft">{withTrueMinus(row.original.source)}</span> },
    { id: 'origin', header: 'Origin', enableSorting: false, cell: ({ row }) => <OriginBadge row={row.original} /> },
  ];
}

export const SPECIES_NUMERIC_COLUMNS = ['dfH', 'dfG', 'S'];
