'use client';

// A search field that offers species as the user types (GET /api/species/search): each match with its drawing (a
// server-drawn image named by name and formula), typeset formula, the phases with data and where the data comes
// from. ARIA combobox with a listbox popup: arrows move, Enter picks, Escape closes then clears.
import { useEffect, useId, useState, type KeyboardEvent } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { speciesSearchQuery, useSpeciesSearch, type SpeciesSearchHit } from '@/lib/queries/species-search';
import { FormulaText } from './formula-text';
import { OriginMark } from './origin-mark';
import type { OriginFacts } from './origin-text';
import { StructureImage } from './structure-image';

const PHASE_WORD: Record<string, string> = { g: 'gas', l: 'liquid', s: 'solid', aq: 'aqueous' };

/** The mark's facts: the library's source, the team's provenance, or a note that a step would estimate it. */
export function hitOrigin(hit: Pick<SpeciesSearchHit, 'origin' | 'phases'>): OriginFacts {
  if (hit.origin === 'estimated') return { origin: 'estimated', method: 'group contribution when a step uses it (no sourced data)' };
  return { origin: hit.origin, source: [...new Set(hit.phases.map((p) => p.source))].join('; ') || null };
}

/** "liquid, gas" or "no data: would be estimated", said the same way on screen and to screen readers. */
export function hitPhases(hit: Pick<SpeciesSearchHit, 'phases'>): string {
  return hit.phases.length ? hit.phases.map((p) => PHASE_WORD[p.phase] ?? p.phase).join(', ') : 'no data: would be estimated';
}

function HitRow({ hit }: { hit: SpeciesSearchHit }) {
  return (
    <>
      {hit.smiles ? (
        <StructureImage smiles={hit.smiles} name={hit.name} formula={hit.formula} width={56} height={42} className="rounded bg-white" />
      ) : (
        <span aria-hidden="true" className="inline-block h-[42px] w-[56px] shrink-0" />
      )}
      <span className="min-w-0 flex-1">
        <span className="block truncate font-medium text-ink">{hit.name}</span>
        <span className="block text-[11px] text-ink-soft">
          <FormulaText value={hit.formula} />
          {hit.cas ? <span className="text-ink-faint"> · CAS {hit.cas}</span> : null}
          <span className="text-ink-faint"> · {hitPhases(hit)}</span>
        </span>
      </span>
      <OriginMark facts={hitOrigin(hit)} className="shrink-0" />
    </>
  );
}

export function SpeciesCombobox({
  label,
  placeholder = 'Name, formula, CAS or InChIKey',
  disabled = false,
  onPick,
}: {
  label: string;
  placeholder?: string;
  disabled?: boolean;
  onPick: (hit: SpeciesSearchHit) => void;
}) {
  const id = useId();
  const inputId = `${id}-input`;
  const listId = `${id}-list`;
  const optionId = (i: number) => `${id}-option-${i}`;
  const [text, setText] = useState('');
  const [isOpen, setOpen] = useState(false);
  const [active, setActive] = useState(-1);
  const search = useSpeciesSearch(text);
  const client = useQueryClient();
  const items = search.enabled && search.data ? search.data.items : [];
  const showPopup = isOpen && text.trim().length > 0;
  const hasList = showPopup && items.length > 0;
  // The list of the previous text stays while the next answer comes, dimmed and not pickable by Enter.
  const isStale = search.isSettling || search.isPlaceholderData;

  useEffect(() => {
    if (active >= 0) document.getElementById(`${id}-option-${active}`)?.scrollIntoView({ block: 'nearest' });
  }, [active, id]);

  function pick(hit: SpeciesSearchHit) {
    onPick(hit);
    setText('');
    setOpen(false);
    setActive(-1);
  }

  function handleKeyDown(e: KeyboardEvent<HTMLInputElement>) {
    if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      setOpen(true);
      if (items.length === 0) return;
      const step = e.key === 'ArrowDown' ? 1 : -1;
      setActive((a) => (a < 0 ? (step > 0 ? 0 : items.length - 1) : (a + step + items.length) % items.length));
    } else if (e.key === 'Enter') {
      e.preventDefault();
      const hit = items[active >= 0 ? active : 0];
      if (hasList && hit && !isStale) pick(hit);
    } else if (e.key === 'Escape') {
      if (isOpen && text) {
        e.preventDefault();
        setOpen(false);
      } else if (text) {
        e.preventDefault();
        setText('');
      }
    } else if (e.key === 'Tab') {
      setOpen(false);
    }
  }

  const waiting = search.enabled && (search.isPending || isStale);
  const status = !showPopup
    ? ''
    : !search.enabled
      ? 'Type at most 100 characters.'
      : search.isError
        ? `Search failed: ${search.error.message}`
        : items.length === 0 && waiting
          ? 'Searching…'
          : items.length === 0
            ? `Nothing matches “${search.settled}”. Try another name, a formula (C8H10O) or a CAS number.`
            : `${items.length} match${items.length === 1 ? '' : 'es'}${waiting ? ', searching…' : ''}. Arrow keys to choose, Enter to add.`;

  return (
    <div className="relative flex flex-col gap-1">
      <label htmlFor={inputId} className="text-xs font-medium text-ink">
        {label}
      </label>
      <input
        id={inputId}
        type="text"
        role="combobox"
        aria-expanded={hasList}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={hasList && active >= 0 ? optionId(active) : undefined}
        autoComplete="off"
        spellCheck={false}
        disabled={disabled}
        value={text}
        placeholder={placeholder}
        maxLength={200}
        onChange={(e) => {
          setText(e.target.value);
          setOpen(true);
          setActive(-1);
        }}
        onFocus={() => {
          setOpen(true);
          // The server builds its search index on the first search of its process (a few seconds): start it now.
          void client.prefetchQuery(speciesSearchQuery('water', 1));
        }}
        onBlur={() => setOpen(false)}
        onKeyDown={handleKeyDown}
        className="w-full rounded-md border border-paper-edge bg-white px-2 py-1 text-sm outline-none focus:border-pine-500 focus:ring-2 focus:ring-pine-100 disabled:bg-paper"
      />
      <p role="status" aria-live="polite" className="sr-only">
        {status}
      </p>
      <div hidden={!showPopup} className="absolute left-0 right-0 top-full z-30 mt-1 max-h-80 overflow-auto rounded-md border border-paper-edge bg-white shadow-lg" data-testid="species-search-popup">
        {status && !hasList ? (
          <p className={`px-2 py-2 text-xs ${search.isError ? 'text-uphill' : 'text-ink-faint'}`} aria-hidden="true">
            {status}
          </p>
        ) : null}
        <ul
          id={listId}
          role="listbox"
          aria-label={`Species matching ${search.settled}`}
          aria-busy={isStale || undefined}
          hidden={!hasList}
          className={`divide-y divide-paper-edge ${isStale ? 'opacity-60' : ''}`}
        >
          {items.map((hit, i) => (
            <li
              key={`${hit.origin}|${hit.inchikey ?? hit.name}|${hit.phases.map((p) => p.key).join(',')}`}
              id={optionId(i)}
              role="option"
              aria-selected={i === active}
              aria-label={`${hit.name}, ${hit.formula}, ${hitPhases(hit)}, ${hit.origin === 'estimated' ? 'estimate' : hit.origin}`}
              // mousedown would blur the field and close the list before the click lands
              onMouseDown={(e) => e.preventDefault()}
              onMouseEnter={() => setActive(i)}
              onClick={() => pick(hit)}
              className={`flex cursor-pointer items-center gap-2 px-2 py-1 text-xs ${i === active ? 'bg-pine-50' : ''}`}
            >
              <HitRow hit={hit} />
            </li>
          ))}
        </ul>
      </div>
    </div>
  );
}
