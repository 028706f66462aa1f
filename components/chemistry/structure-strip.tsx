'use client';

// A step's structures in one compact row, reactants ⟶ products: server-drawn images for species with a carbon
// skeleton, typeset formulas for the small ones. Hover or keyboard focus opens a larger view (in a portal, so the
// board's zoom and neighbouring nodes never cover it); Escape closes it. Every drawing's alt names the species and
// its formula.
import { useCallback, useId, useRef, useState, type KeyboardEvent } from 'react';
import { createPortal } from 'react-dom';
import { FormulaText } from './formula-text';
import { OriginMark } from './origin-mark';
import { isDrawable, type StepStructures, type StructureBrief } from './structure-brief';
import { StructureImage } from './structure-image';

/** One size for every compact drawing, so the server's cache and the browser's hold one picture per structure. */
export const SMALL_DRAWING = { width: 40, height: 30 } as const;
export const LARGE_DRAWING = { width: 144, height: 108 } as const;

function listNames(items: readonly StructureBrief[]): string {
  return items.map((s) => (s.formula && s.formula !== s.name ? `${s.name} (${s.formula})` : s.name)).join(', ');
}

/** "consumes ethanol (C2H6O), acetic acid (C2H4O2); makes ethyl acetate (C4H8O2), water (H2O)" */
export function structuresSentence(s: StepStructures): string {
  const parts = [s.reactants.length ? `consumes ${listNames(s.reactants)}` : '', s.products.length ? `makes ${listNames(s.products)}` : ''];
  return parts.filter(Boolean).join('; ');
}

function Small({ s, loading }: { s: StructureBrief; loading: 'lazy' | 'eager' }) {
  if (isDrawable(s)) return <StructureImage smiles={s.smiles} name={s.name} formula={s.formula} {...SMALL_DRAWING} loading={loading} className="rounded-sm bg-white" />;
  // Small species as typeset formulas; the title and alt-like label give the name.
  return (
    <span role="img" aria-label={s.formula && s.formula !== s.name ? `${s.name} (${s.formula})` : s.name} title={s.name} className="inline-flex h-[30px] items-center px-0.5 text-[11px] text-ink-soft">
      <FormulaText value={s.asWritten} name={s.name} formula={s.formula} />
    </span>
  );
}

function Side({ items, max, loading }: { items: readonly StructureBrief[]; max: number; loading: 'lazy' | 'eager' }) {
  const shown = items.slice(0, max);
  const hidden = items.slice(max);
  return (
    <span className="flex items-center gap-0.5">
      {shown.map((s, i) => (
        <span key={s.key} className="flex items-center gap-0.5">
          {i > 0 ? <span aria-hidden="true" className="text-[10px] text-ink-faint">+</span> : null}
          <Small s={s} loading={loading} />
        </span>
      ))}
      {hidden.length ? (
        <span className="text-[10px] text-ink-faint" title={listNames(hidden)}>
          +{hidden.length}
          <span className="sr-only"> more: {listNames(hidden)}</span>
        </span>
      ) : null}
    </span>
  );
}

function Large({ s }: { s: StructureBrief }) {
  return (
    <li className="flex w-36 flex-col items-center gap-0.5 text-center">
      {isDrawable(s) ? (
        <StructureImage smiles={s.smiles} name={s.name} formula={s.formula} {...LARGE_DRAWING} />
      ) : (
        <span role="img" aria-label={s.formula && s.formula !== s.name ? `${s.name} (${s.formula})` : s.name} className="flex h-[108px] items-center text-lg text-ink">
          <FormulaText value={s.asWritten} name={s.name} formula={s.formula} />
        </span>
      )}
      <span className="text-xs font-medium text-ink">{s.name}</span>
      {s.formula ? <FormulaText value={s.formula} className="text-[11px] text-ink-soft" /> : null}
      {s.origin ? <OriginMark facts={{ origin: s.origin }} /> : null}
    </li>
  );
}

export function StructureStrip({
  structures,
  label,
  max = 3,
  className = '',
  loading = 'lazy',
  focusable = true,
}: {
  structures: StepStructures;
  /** what the drawings belong to, e.g. the step's label */
  label: string;
  max?: number;
  className?: string;
  loading?: 'lazy' | 'eager';
  /** false where it sits among many (the palette): no tab stop of its own, its words stay in the name */
  focusable?: boolean;
}) {
  const [anchor, setAnchor] = useState<DOMRect | null>(null);
  const ref = useRef<HTMLDivElement | null>(null);
  const popupId = useId();
  const open = useCallback(() => setAnchor(ref.current?.getBoundingClientRect() ?? null), []);
  const close = useCallback(() => setAnchor(null), []);
  const handleKeyDown = (event: KeyboardEvent) => {
    if (event.key === 'Escape' && anchor) {
      event.stopPropagation();
      close();
    }
  };
  if (structures.reactants.length + structures.products.length === 0) return null;
  const sentence = structuresSentence(structures);
  return (
    <div
      ref={ref}
      tabIndex={focusable ? 0 : -1}
      role="group"
      aria-label={`Structures of ${label}: ${sentence}.${focusable ? ' Focus shows them larger.' : ''}`}
      aria-describedby={anchor ? popupId : undefined}
      onMouseEnter={open}
      onMouseLeave={close}
      onFocus={open}
      onBlur={close}
      onKeyDown={handleKeyDown}
      className={`flex min-h-[30px] flex-wrap items-center gap-1 rounded outline-none focus-visible:ring-2 focus-visible:ring-pine-500 ${className}`}
      data-testid="structure-strip"
    >
      <Side items={structures.reactants} max={max} loading={loading} />
      {structures.products.length ? (
        <span aria-hidden="true" className="px-0.5 text-ink-faint">
          ⟶
        </span>
      ) : null}
      <Side items={structures.products} max={max} loading={loading} />
      {anchor && typeof document !== 'undefined'
        ? createPortal(
            <div
              id={popupId}
              role="group"
              aria-label={`Structures of ${label}, larger`}
              style={{ position: 'fixed', top: Math.min(anchor.bottom + 6, window.innerHeight - 200), left: Math.max(8, Math.min(anchor.left, window.innerWidth - 520)) }}
              className="pointer-events-none z-50 flex max-w-[32rem] flex-wrap items-center gap-2 rounded-md border border-paper-edge bg-white p-2 shadow-lg"
              data-testid="structure-enlarged"
            >
              <ul className="flex flex-wrap gap-2">
                {structures.reactants.map((s) => (
                  <Large key={s.key} s={s} />
                ))}
              </ul>
              {structures.products.length ? (
                <span aria-hidden="true" className="text-xl text-ink-faint">
                  ⟶
                </span>
              ) : null}
              <ul className="flex flex-wrap gap-2">
                {structures.products.map((s) => (
                  <Large key={s.key} s={s} />
                ))}
              </ul>
            </div>,
            document.body,
          )
        : null}
    </div>
  );
}
