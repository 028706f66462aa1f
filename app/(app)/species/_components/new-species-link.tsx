'use client';

// "New species from a structure" as a link, carrying what the user typed and the page to come back to; on the route
// board (under its opener) a button that opens the same flow in a dialog over the board.
import Link from 'next/link';
import { usePathname } from 'next/navigation';
import type { ReactNode } from 'react';
import { fromStructureHref } from './from-structure-href';
import { useNewSpeciesOpener } from './new-species-opener';

export function NewSpeciesLink({ smiles, name, phase, className, children }: { smiles?: string | null; name?: string | null; phase?: string | null; className?: string; children?: ReactNode }) {
  const pathname = usePathname();
  const open = useNewSpeciesOpener();
  const look = className ?? 'font-medium text-pine-700 underline underline-offset-2';
  const text = children ?? 'New species from a structure';
  if (open) {
    return (
      <button type="button" aria-haspopup="dialog" onClick={(event) => open({ smiles, name, phase }, event.currentTarget)} className={`text-left ${look}`} data-testid="new-species-link">
        {text}
      </button>
    );
  }
  return (
    <Link href={fromStructureHref({ smiles, name, phase, returnTo: pathname })} className={look} data-testid="new-species-link">
      {text}
    </Link>
  );
}
