'use client';

// "New species from a structure" as a link, carrying what the user typed and the page to come back to.
import Link from 'next/link';
import { usePathname } from 'next/navigation';
import type { ReactNode } from 'react';
import { fromStructureHref } from './from-structure-href';

export function NewSpeciesLink({ smiles, name, phase, className, children }: { smiles?: string | null; name?: string | null; phase?: string | null; className?: string; children?: ReactNode }) {
  const pathname = usePathname();
  return (
    <Link href={fromStructureHref({ smiles, name, phase, returnTo: pathname })} className={className ?? 'font-medium text-pine-700 underline underline-offset-2'} data-testid="new-species-link">
      {children ?? 'New species from a structure'}
    </Link>
  );
}
