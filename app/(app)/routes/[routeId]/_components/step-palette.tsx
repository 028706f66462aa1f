'use client';

import { useQuery } from '@tanstack/react-query';
import { useId, useRef, useState, type KeyboardEvent } from 'react';
import { writeStepPayload, type StepDragPayload } from '@/components/canvas/step-drop';
import { EquationText } from '@/components/chemistry/equation-text';
import { namesOf, type StepStructures } from '@/components/chemistry/structure-brief';
import { StructureStrip } from '@/components/chemistry/structure-strip';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { paletteQuery } from '@/lib/queries/routes';
import { NewSpeciesLink } from '../../../species/_components/new-species-link';

/** One tab stop for all the Add buttons (roving tabindex): the arrow keys move between them, Tab leaves the palette. */
interface Roving {
  key: string;
  isTabStop: boolean;
  hintId: string;
  onFocus: (key: string) => void;
}

function PaletteItem({ title, equation, structures, species, onAdd, roving }: { title: string | null; equation: string; structures?: StepStructures; species?: StepDragPayload['species']; onAdd: (payload: StepDragPayload) => void; roving: Roving }) {
  const name = title ?? equation;
  const payload: StepDragPayload = species ? { equation, species } : { equation };
  return (
    <li
      draggable
      onDragStart={(event) => writeStepPayload(event.dataTransfer, payload)}
      className="group flex cursor-grab items-start justify-between gap-2 rounded-md border border-paper-edge bg-white px-2 py-1.5 text-xs hover:border-pine-500 active:cursor-grabbing"
      data-testid="palette-item"
    >
      <div className="min-w-0">
        {title ? <span className="block font-medium text-ink">{title}</span> : null}
        {structures ? <StructureStrip structures={structures} label={name} max={2} className="my-0.5" focusable={false} /> : null}
        {equation ? <EquationText equation={equation} names={namesOf(structures)} className="block break-words text-[11px] text-ink-soft" /> : null}
      </div>
      <button
        type="button"
        onClick={() => onAdd(payload)}
        aria-label={`Add step: ${name}${title && equation ? ` (${equation})` : ''}`}
        aria-describedby={roving.hintId}
        tabIndex={roving.isTabStop ? 0 : -1}
        onFocus={() => roving.onFocus(roving.key)}
        data-roving-add
        className="shrink-0 rounded border border-paper-edge px-1.5 py-0.5 text-pine-700 hover:bg-pine-50 focus-visible:outline focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-pine-700"
      >
        Add
      </button>
    </li>
  );
}

// Steps to drag onto the board: a blank one, the team's recent equations, library reactions by species.
export function StepPalette({ onAdd }: { onAdd: (payload: StepDragPayload) => void }) {
  const searchId = useId();
  const [species, setSpecies] = useState('');
  const wanted = useDebouncedValue(species.trim(), 300);
  const palette = useQuery(paletteQuery(wanted));
  const box = useRef<HTMLElement>(null);
  const hintId = useId();
  const [current, setCurrent] = useState('blank');
  const keys = ['blank', ...(palette.data?.recent ?? []).map((e) => `recent:${e}`), ...(palette.data?.library ?? []).map((r) => `library:${r.id}`)];
  const stop = keys.includes(current) ? current : 'blank';
  const roving = (key: string): Roving => ({ key, isTabStop: key === stop, hintId, onFocus: setCurrent });

  const handleKeyDown = (event: KeyboardEvent<HTMLElement>) => {
    if (!(event.target instanceof HTMLElement) || !event.target.hasAttribute('data-roving-add')) return;
    const buttons = Array.from(box.current?.querySelectorAll<HTMLElement>('[data-roving-add]') ?? []);
    const at = buttons.indexOf(event.target);
    const to = { ArrowDown: at + 1, ArrowUp: at - 1, Home: 0, End: buttons.length - 1 }[event.key];
    if (to === undefined) return;
    event.preventDefault();
    const next = buttons[Math.max(0, Math.min(buttons.length - 1, to))];
    next?.focus();
    next?.scrollIntoView({ block: 'nearest' });
  };

  return (
    <aside ref={box} aria-label="Step palette" className="flex h-full flex-col gap-3 overflow-y-auto pr-1" onKeyDown={handleKeyDown}>
      <p id={hintId} className="text-[11px] text-ink-faint">
        ↑ ↓ move between steps · Enter adds one to the board
      </p>
      <section>
        <h2 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-faint">New step</h2>
        <ul>
          <PaletteItem title="Blank step" equation="" onAdd={onAdd} roving={roving('blank')} />
        </ul>
        <p className="mt-1.5 text-xs">
          <NewSpeciesLink />
        </p>
      </section>
      <section>
        <h2 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-faint">Recent in your team</h2>
        {palette.data && palette.data.recent.length > 0 ? (
          <ul className="flex flex-col gap-1">
            {palette.data.recent.map((equation) => (
              <PaletteItem key={equation} title={null} equation={equation} structures={palette.data.structures?.[equation]} species={palette.data.labels?.[equation]} onAdd={onAdd} roving={roving(`recent:${equation}`)} />
            ))}
          </ul>
        ) : (
          <p className="text-xs text-ink-faint">{palette.isPending ? 'Loading…' : 'None yet.'}</p>
        )}
      </section>
      <section>
        <h2 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-faint">Library</h2>
        <label htmlFor={searchId} className="text-xs text-ink-soft">
          Reactions with species
        </label>
        <input
          id={searchId}
          type="search"
          value={species}
          onChange={(e) => setSpecies(e.target.value)}
          placeholder="e.g. CH3OH(g)"
          className="mb-1.5 mt-0.5 w-full rounded-md border border-paper-edge bg-white px-2 py-1 font-mono text-xs outline-none focus:border-pine-500 focus:ring-2 focus:ring-pine-100"
        />
        {palette.isError ? <p className="text-xs text-uphill">{palette.error.message}</p> : null}
        {palette.data ? (
          palette.data.library.length > 0 ? (
            <ul className="flex flex-col gap-1" aria-busy={palette.isFetching}>
              {palette.data.library.map((reaction) => (
                <PaletteItem key={reaction.id} title={reaction.name} equation={reaction.equation} structures={palette.data.structures?.[reaction.equation]} onAdd={onAdd} roving={roving(`library:${reaction.id}`)} />
              ))}
            </ul>
          ) : (
            <p className="text-xs text-ink-faint">No library reaction has “{wanted}”.</p>
          )
        ) : null}
      </section>
    </aside>
  );
}
