'use client';

import { useQuery } from '@tanstack/react-query';
import { When } from '@/components/ui/when';
import { speciesImportsQuery } from '@/lib/queries/species';

/** Earlier uploads of the team, each downloadable exactly as it was sent. */
export function ImportHistory() {
  const imports = useQuery(speciesImportsQuery());
  return (
    <section aria-labelledby="history" className="mt-8 flex flex-col gap-2">
      <h2 id="history" className="text-base font-semibold">Earlier uploads</h2>
      {imports.isPending ? (
        <p role="status" className="text-sm text-ink-soft">Loading…</p>
      ) : imports.isError ? (
        <p className="text-sm text-uphill">{imports.error.message}</p>
      ) : imports.data.items.length === 0 ? (
        <p className="text-sm text-ink-soft">No species file has been uploaded in your team yet.</p>
      ) : (
        <ul className="flex flex-col gap-1 text-sm">
          {imports.data.items.map((i) => (
            <li key={i.id} className="flex flex-wrap items-baseline gap-x-2">
              <a href={`/api/species/imports/${i.id}/file`} className="break-all font-medium text-pine-700 underline-offset-2 hover:underline" download>{i.fileName}</a>
              <span className="text-ink-soft">{i.counts.rows} rows, {i.status === 'committed' ? `imported (${i.counts.created} added, ${i.counts.overridden} overridden, ${i.counts.skipped} skipped)` : 'previewed, not imported'}</span>
              <span className="text-ink-faint">by {i.importedBy ?? 'a former member'},</span>
              <When iso={i.createdAt} />
              <span className="font-mono text-xs text-ink-faint" title={i.checksum}>SHA-256 {i.checksum.slice(0, 12)}…</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
