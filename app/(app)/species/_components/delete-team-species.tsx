'use client';

// Deleting a team species: asked first, refused while any route uses it (the routes and steps are listed with links,
// since deleting it would change their ΔG behind their backs), and refused when someone saved it since.
import { useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/queries/api-fetch';
import { speciesKeys } from '@/lib/queries/species';
import { deleteTeamSpecies, type SpeciesInUse } from '@/lib/queries/species-structure';

type Outcome = { kind: 'deleted'; name: string } | { kind: 'in-use'; message: string; routes: SpeciesInUse[] } | { kind: 'error'; message: string };

function UsedBy({ routes }: { routes: SpeciesInUse[] }) {
  return (
    <ul className="mt-1 list-disc pl-5" aria-label="Routes that use this species">
      {routes.map((r) => (
        <li key={r.href}>
          <Link href={r.href} className="font-medium underline">{r.routeName}</Link>
          {r.archived ? ' (archived)' : ''}: {r.steps.map((s) => `step ${s.number} (${s.equation})`).join('; ')}
        </li>
      ))}
    </ul>
  );
}

export function DeleteTeamSpecies({ id, name, version }: { id: number; name: string; version: number }) {
  const queryClient = useQueryClient();
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<Outcome | null>(null);

  async function handleDelete() {
    setBusy(true);
    try {
      await deleteTeamSpecies(id, version);
      setOutcome({ kind: 'deleted', name });
      await queryClient.invalidateQueries({ queryKey: speciesKeys.all });
    } catch (error) {
      const routes = error instanceof ApiError ? (error.details?.routes as SpeciesInUse[] | undefined) : undefined;
      if (error instanceof ApiError && error.status === 409 && routes) setOutcome({ kind: 'in-use', message: error.message, routes });
      else setOutcome({ kind: 'error', message: error instanceof Error ? error.message : 'The species could not be deleted.' });
    } finally {
      setBusy(false);
      setAsking(false);
    }
  }

  if (outcome?.kind === 'deleted') {
    return (
      <Notice tone="success" title={`“${outcome.name}” deleted`}>
        Your team’s evaluations use the library or an estimate for this species from now on. <Link href="/species" className="underline">Back to the species list</Link>
      </Notice>
    );
  }
  return (
    <section aria-label="Delete this species" className="flex max-w-3xl flex-col gap-2 border-t border-paper-edge pt-4">
      <h2 className="text-sm font-semibold text-ink">Delete</h2>
      <p className="text-sm text-ink-soft">Only a species no route uses can be deleted: a route that uses it would silently change its ΔG.</p>
      {outcome?.kind === 'in-use' ? (
        <Notice tone="caution" title="Still in use, so not deleted">
          <p>Change these steps to another species first:</p>
          <UsedBy routes={outcome.routes} />
        </Notice>
      ) : null}
      {outcome?.kind === 'error' ? <Notice tone="error">{outcome.message}</Notice> : null}
      <div>
        <Button variant="secondary" onClick={() => setAsking(true)} disabled={busy} data-testid="delete-species">Delete this species…</Button>
      </div>
      <Dialog open={asking} title={`Delete “${name}”?`} onClose={() => setAsking(false)}>
        <p className="text-sm">It is removed from your team’s species. Routes that mention it by name or structure will then use the library value or an estimate, so Stepwell refuses while any route uses it.</p>
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={() => setAsking(false)}>Keep it</Button>
          <Button variant="danger" onClick={() => void handleDelete()} disabled={busy}>{busy ? 'Deleting…' : 'Delete'}</Button>
        </div>
      </Dialog>
    </section>
  );
}
