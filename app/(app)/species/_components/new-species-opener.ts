'use client';

// On the route board, "New species from a structure" opens a dialog over the board instead of leaving it: the board
// provides this opener, and every NewSpeciesLink under it becomes a button that calls it with what was typed.
import { createContext, useContext } from 'react';

export interface NewSpeciesAsk {
  smiles?: string | null;
  name?: string | null;
  phase?: string | null;
}

/** `trigger` is where the focus goes back to when the dialog closes (if it is still on the page). */
export type OpenNewSpecies = (ask: NewSpeciesAsk, trigger: HTMLElement | null) => void;

export const NewSpeciesOpenerContext = createContext<OpenNewSpecies | null>(null);

export function useNewSpeciesOpener(): OpenNewSpecies | null {
  return useContext(NewSpeciesOpenerContext);
}
