'use client';

// A structure drawn by the server (GET /api/structures/svg) as a plain <img>: no chemistry code reaches the browser.
// The alt text names the species and its formula, so the drawing is never the only way to know what it is.
import { useState } from 'react';

export function structureSvgPath(smiles: string, width: number, height: number): string {
  return `/api/structures/svg?${new URLSearchParams({ smiles, w: String(width), h: String(height) }).toString()}`;
}

/** "ethanol (C2H6O)", or whichever of the two is known. */
export function structureAlt(name: string | null | undefined, formula: string | null | undefined): string {
  const n = name?.trim();
  const f = formula?.trim();
  if (n && f) return `${n} (${f})`;
  return n || f || 'chemical structure';
}

export function StructureImage({
  smiles,
  name,
  formula,
  width = 96,
  height = 72,
  className = '',
  loading = 'lazy',
}: {
  smiles: string;
  /** "eager" where the page is printed: a lazy image below the fold may not be fetched before the print dialog */
  loading?: 'lazy' | 'eager';
  name?: string | null;
  formula?: string | null;
  width?: number;
  height?: number;
  className?: string;
}) {
  const [failed, setFailed] = useState(false);
  const alt = structureAlt(name, formula);
  if (failed) {
    // Same box, so a list does not jump; the words still say what the species is.
    return (
      <span role="img" aria-label={alt} style={{ width, height }} className={`inline-flex shrink-0 items-center justify-center rounded border border-dashed border-paper-edge text-[10px] text-ink-faint ${className}`}>
        no drawing
      </span>
    );
  }
  return (
    <img src={structureSvgPath(smiles, width, height)} alt={alt} width={width} height={height} loading={loading} decoding="async" onError={() => setFailed(true)} className={`shrink-0 ${className}`} />
  );
}
