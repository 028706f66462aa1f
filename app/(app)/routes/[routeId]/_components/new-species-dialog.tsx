'use client';

// "New species from a structure" in a dialog over the route board. Every NewSpeciesLink under this provider opens it,
// carrying what the step wrote; the selected step is the one that asked. Once saved (or found in the library or the
// team's species) the species takes its place in that step as the Add species search would write it, or, when the step
// did not write it, the user picks a side. The flow itself loads only when the dialog first opens.
import dynamic from 'next/dynamic';
import { useCallback, useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { useIsPhone } from '@/lib/hooks/use-media-query';
import { stepLabels } from '@/lib/route-editor/step-label';
import { useRouteEditorStoreApi } from '@/stores/route-editor-store';
import { NewSpeciesOpenerContext, type NewSpeciesAsk, type OpenNewSpecies } from '../../../species/_components/new-species-opener';
import type { SavedStructureSpecies } from '../../../species/from-structure/new-species-flow';
import { MAX_EQUATION, placeAsked, placeOnSide, receivingStep, type PickedSpecies, type Placement, type SpeciesAsk } from './new-species-placement';
import { PHASE_WORDS, type Side } from './species-insert';

const Loading = () => <p className="text-sm text-ink-soft" role="status">Loading…</p>;
const NewSpeciesFlow = dynamic(() => import('../../../species/from-structure/new-species-flow').then((m) => m.NewSpeciesFlow), { ssr: false, loading: Loading });
const SavedSpeciesNotice = dynamic(() => import('../../../species/from-structure/saved-species-notice').then((m) => m.SavedSpeciesNotice), { ssr: false, loading: Loading });
const EditorsOnly = dynamic(() => import('../../../species/_components/editors-only').then((m) => m.EditorsOnly), { ssr: false, loading: Loading });

const PHASES = new Set(['g', 'l', 's', 'aq']);
const PALETTE = 'aside[aria-label="Step palette"]';
const EQUATION_FIELD = 'form[aria-label="Step"] textarea';

interface Asked {
  ask: SpeciesAsk;
  /** the step selected when the dialog opened: the one whose panel asked */
  stepId: string | null;
  trigger: HTMLElement | null;
}

/** What a link carried, trimmed and checked as the page checks its search params. */
function cleanAsk(ask: NewSpeciesAsk): SpeciesAsk {
  const text = (v: string | null | undefined, max: number) => (v?.trim() ? v.trim().slice(0, max) : null);
  return { smiles: text(ask.smiles, 600), name: text(ask.name, 120), phase: ask.phase && PHASES.has(ask.phase) ? ask.phase : null };
}

/** Only where the board edits the route: on a read-only route or a phone's read-only view the links lead to the page, which changes no route. */
export function NewSpeciesDialogProvider({ enabled, children }: { enabled: boolean; children: ReactNode }) {
  const store = useRouteEditorStoreApi();
  const [asked, setAsked] = useState<Asked | null>(null);
  const [found, setFound] = useState<{ pick: PickedSpecies; saved: SavedStructureSpecies | null } | null>(null);
  const [said, setSaid] = useState('');
  const foundBox = useRef<HTMLDivElement>(null);
  // The Save button the focus was on is gone once saved: the focus moves to what the user can do next.
  useEffect(() => {
    if (found) foundBox.current?.querySelector<HTMLElement>('button')?.focus();
  }, [found]);

  const open = useCallback<OpenNewSpecies>(
    (ask, trigger) => {
      setFound(null);
      setSaid('');
      setAsked({ ask: cleanAsk(ask), stepId: store.getState().selectedStepId, trigger });
    },
    [store],
  );

  // Focus goes back to the link that opened the dialog; once the species is placed, a link in the step panel is about
  // to go (the step no longer lacks it), so focus goes to the step's equation, where the change shows.
  const close = (placedIn: string | null) => {
    const trigger = asked?.trigger ?? null;
    setAsked(null);
    setFound(null);
    requestAnimationFrame(() => {
      if (trigger?.isConnected && (!placedIn || trigger.closest(PALETTE))) return trigger.focus();
      if (!placedIn) return;
      (document.querySelector<HTMLElement>(EQUATION_FIELD) ?? document.querySelector<HTMLElement>(`.react-flow__node[data-id="${CSS.escape(placedIn)}"]`))?.focus();
    });
  };

  const target = () => {
    const { doc, selectedStepId } = store.getState();
    const id = receivingStep(asked?.stepId ?? null, selectedStepId, doc.steps.map((s) => s.id));
    return id ? { step: doc.steps.find((s) => s.id === id)!, label: stepLabels(doc.steps, doc.links).get(id)?.short ?? 'the step' } : null;
  };

  const apply = (stepId: string, label: string, pick: PickedSpecies, placement: Placement) => {
    store.getState().updateStep(stepId, { equation: placement.equation, species: placement.species });
    store.getState().selectStep(stepId);
    const where = placement.how === 'added' ? 'added to' : 'now named in';
    setSaid(`${pick.name}, ${PHASE_WORDS[pick.phase]}, ${where} ${label} as ${placement.term}.`);
    close(stepId);
  };

  // The step that asked gets it where it wrote it; otherwise the dialog offers the sides.
  const handleFound = (pick: PickedSpecies, saved: SavedStructureSpecies | null) => {
    const to = target();
    const placement = to && asked ? placeAsked(to.step, asked.ask, pick) : null;
    if (to && placement && placement.equation.length <= MAX_EQUATION) return apply(to.step.id, to.label, pick, placement);
    setFound({ pick, saved });
  };

  const isPhone = useIsPhone();
  const to = found ? target() : null;
  if (!enabled || isPhone) return <>{children}</>;
  return (
    <NewSpeciesOpenerContext.Provider value={open}>
      {children}
      <p className="sr-only" aria-live="polite" data-testid="new-species-said">
        {said}
      </p>
      <Dialog open={asked !== null} title="New species from a structure" onClose={() => close(null)} wide>
        {asked && !found ? (
          <EditorsOnly>
            <p className="text-sm text-ink-soft">Paste a SMILES or a molfile. Stepwell shows what it knows of the molecule, or its group-additivity estimate with σ and every group it used, before anything is saved.</p>
            <NewSpeciesFlow
              seed={{ smiles: asked.ask.smiles ?? null, name: asked.ask.name ?? null, phase: asked.ask.phase ?? null }}
              onSaved={(saved) => handleFound({ name: saved.name, smiles: saved.smiles, phase: saved.phase as PickedSpecies['phase'], key: saved.key }, saved)}
              onUseExisting={(pick) => handleFound(pick, null)}
              autoFocus
            />
          </EditorsOnly>
        ) : null}
        {asked && !found ? (
          <div className="border-t border-paper-edge pt-3">
            <Button variant="quiet" onClick={() => close(null)}>
              Cancel
            </Button>
          </div>
        ) : null}
        {asked && found ? (
          <div ref={foundBox} className="flex flex-col gap-3">
            {found.saved ? <SavedSpeciesNotice saved={found.saved} returnTo={null} howToUse={to === null} /> : null}
            {to ? <OfferToStep label={to.label} pick={found.pick} onAdd={(side) => apply(to.step.id, to.label, found.pick, placeOnSide(to.step, found.pick, side))} onNotNow={() => close(null)} tooLong={(side) => placeOnSide(to.step, found.pick, side).equation.length > MAX_EQUATION} /> : (
              <div className="flex flex-col gap-2 text-sm">
                <p>Select a step, then find it by its name in the step’s Add species search.</p>
                <div>
                  <Button onClick={() => close(null)}>Close</Button>
                </div>
              </div>
            )}
          </div>
        ) : null}
      </Dialog>
    </NewSpeciesOpenerContext.Provider>
  );
}

function OfferToStep({ label, pick, onAdd, onNotNow, tooLong }: { label: string; pick: PickedSpecies; onAdd: (side: Side) => void; onNotNow: () => void; tooLong: (side: Side) => boolean }) {
  const id = useId();
  const [side, setSide] = useState<Side>('reactants');
  const refused = tooLong(side);
  return (
    <section aria-label={`Add it to ${label}`} className="flex flex-col gap-2 text-sm">
      <fieldset className="flex flex-wrap items-center gap-3">
        <legend className="mb-1 font-semibold">
          Add {pick.name} ({pick.phase}) to {label} as
        </legend>
        {(['reactants', 'products'] as const).map((s) => (
          <label key={s} className="flex items-center gap-1.5">
            <input type="radio" name={`${id}-side`} value={s} checked={side === s} onChange={() => setSide(s)} className="accent-pine-600" />
            {s === 'reactants' ? 'Reactant' : 'Product'}
          </label>
        ))}
      </fieldset>
      {refused ? <p className="text-uphill">The equation would pass {MAX_EQUATION} characters; shorten it first.</p> : null}
      <div className="flex gap-2">
        <Button onClick={() => onAdd(side)} disabled={refused}>
          Add to {label}
        </Button>
        <Button variant="quiet" onClick={onNotNow}>
          Not now
        </Button>
      </div>
    </section>
  );
}
