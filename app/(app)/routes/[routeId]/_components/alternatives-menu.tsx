'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { StatusBadge } from '@/components/review/status-badge';
import { Button } from '@/components/ui/button';
import { When } from '@/components/ui/when';
import { comparePageHref, routeAlternativesQuery } from '@/lib/queries/routes';
import { MAX_COMPARE } from '@/lib/schemas/compare';
import type { RouteAlternativesDto, RouteRefDto } from '@/lib/services/routes/list-alternatives';

/** This route first, then its origin and its alternatives, newest edit first; archived ones cannot be compared; at most 4 in all. */
export function alternativesCompareIds(routeId: number, data: RouteAlternativesDto): { ids: number[]; leftOut: number } {
  const others = [...(data.origin ? [data.origin] : []), ...data.alternatives].filter((r) => !r.archived && r.id !== routeId).map((r) => r.id);
  const ids = [routeId, ...others].slice(0, MAX_COMPARE);
  return { ids, leftOut: 1 + others.length - ids.length };
}

function RouteLine({ route, children }: { route: RouteRefDto; children?: ReactNode }) {
  return (
    <li className="flex flex-wrap items-center gap-1.5 py-1">
      <Link href={`/routes/${route.id}`} className="font-medium text-pine-700 underline-offset-2 hover:underline">
        {route.name}
      </Link>
      <StatusBadge status={route.status} />
      {route.archived ? <span className="text-xs text-ink-faint">archived, not compared</span> : null}
      {children}
    </li>
  );
}

/** The open menu's content: where this route came from, what was duplicated from it, and the compare link. */
export function AlternativesList({ routeId, data }: { routeId: number; data: RouteAlternativesDto }) {
  const { ids, leftOut } = alternativesCompareIds(routeId, data);
  const total = (data.origin ? 1 : 0) + data.alternatives.length;
  if (total === 0) {
    return <p className="text-sm text-ink-soft">No alternatives yet. Duplicate this route as an alternative from the routes list, then compare the two.</p>;
  }
  return (
    <div className="flex flex-col gap-2 text-sm">
      {data.origin ? (
        <section>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Duplicated from</h3>
          <ul>
            <RouteLine route={data.origin} />
          </ul>
        </section>
      ) : null}
      {data.alternatives.length ? (
        <section>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Duplicated from this route</h3>
          <ul>
            {data.alternatives.map((route) => (
              <RouteLine key={route.id} route={route}>
                <span className="text-xs text-ink-faint">
                  edited <When iso={route.updatedAt} />
                </span>
              </RouteLine>
            ))}
          </ul>
        </section>
      ) : null}
      {ids.length >= 2 ? (
        <div className="border-t border-paper-edge pt-2">
          <Link href={comparePageHref(ids)} className="inline-flex rounded-md bg-pine-600 px-3 py-1.5 font-medium text-white hover:bg-pine-700">
            Compare these
          </Link>
          {leftOut > 0 ? (
            <p className="mt-1 text-xs text-ink-faint">{`At most ${MAX_COMPARE} routes are compared at once; ${leftOut} more ${leftOut === 1 ? 'is' : 'are'} left out. Tick the ones you want on the routes list.`}</p>
          ) : null}
        </div>
      ) : (
        <p className="border-t border-paper-edge pt-2 text-xs text-ink-faint">Archived routes cannot be compared; unarchive one to compare it with this route.</p>
      )}
    </div>
  );
}

// A disclosure in the editor header: closes on Escape or a click elsewhere.
export function AlternativesMenu({ routeId }: { routeId: number }) {
  const [isOpen, setIsOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const alternatives = useQuery(routeAlternativesQuery(routeId));

  useEffect(() => {
    if (!isOpen) return;
    const onPointer = (e: PointerEvent) => {
      if (rootRef.current && !rootRef.current.contains(e.target as Node)) setIsOpen(false);
    };
    document.addEventListener('pointerdown', onPointer);
    return () => document.removeEventListener('pointerdown', onPointer);
  }, [isOpen]);

  const count = alternatives.data ? (alternatives.data.origin ? 1 : 0) + alternatives.data.alternatives.length : null;
  return (
    <div
      ref={rootRef}
      className="relative"
      onKeyDown={(e) => {
        if (e.key === 'Escape' && isOpen) {
          e.stopPropagation();
          setIsOpen(false);
        }
      }}
    >
      <Button variant="secondary" aria-expanded={isOpen} aria-controls={panelId} onClick={() => setIsOpen(!isOpen)}>
        {count === null ? 'Alternatives' : `Alternatives (${count})`}
        <span aria-hidden="true" className="text-[10px]">
          {isOpen ? '▲' : '▼'}
        </span>
      </Button>
      <div id={panelId} hidden={!isOpen} className="absolute left-0 z-20 mt-1 w-80 max-w-[calc(100vw-2rem)] rounded-lg border border-paper-edge bg-white p-3 shadow-lg">
        {alternatives.isPending ? (
          <p className="text-sm text-ink-soft" role="status">
            Loading alternatives…
          </p>
        ) : alternatives.isError ? (
          <p className="text-sm text-uphill" role="alert">
            Alternatives could not be loaded: {alternatives.error.message}{' '}
            <button type="button" className="underline" onClick={() => alternatives.refetch()}>
              Try again
            </button>
          </p>
        ) : (
          <AlternativesList routeId={routeId} data={alternatives.data} />
        )}
      </div>
    </div>
  );
}
