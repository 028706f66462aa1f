'use client';

import { useEffect, type RefObject } from 'react';

// React Flow draws its edges before its nodes, so the browser would Tab through every link before the first step.
// This puts the board's stops in reading order instead: the steps in route order, then the links, then the rest
// (zoom buttons), while the page's stops before and after the board keep theirs.

const TABBABLE =
  'a[href],button:not([disabled]),input:not([disabled]):not([type="hidden"]),select:not([disabled]),textarea:not([disabled]),summary,[tabindex],[contenteditable="true"]';

function isTabbable(el: Element): el is HTMLElement | SVGElement {
  if (!(el instanceof HTMLElement || el instanceof SVGElement)) return false;
  if (el.tabIndex < 0 || el.closest('[inert],[hidden]')) return false;
  return el.getClientRects().length > 0;
}

function tabbablesIn(root: ParentNode): (HTMLElement | SVGElement)[] {
  return Array.from(root.querySelectorAll(TABBABLE)).filter(isTabbable);
}

/** The board's stops in reading order: each node then what it holds, the edges, then whatever else is on the board. */
export function boardStops(container: HTMLElement, nodeIds: readonly string[], edgeIds: readonly string[]): (HTMLElement | SVGElement)[] {
  const out: (HTMLElement | SVGElement)[] = [];
  for (const id of nodeIds) {
    const node = container.querySelector(`.react-flow__node[data-id="${CSS.escape(id)}"]`);
    if (node && isTabbable(node)) out.push(node, ...tabbablesIn(node));
  }
  for (const id of edgeIds) {
    const edge = container.querySelector(`[data-testid="${CSS.escape(`rf__edge-${id}`)}"]`);
    if (edge && isTabbable(edge)) out.push(edge);
  }
  const taken = new Set<Element>(out);
  return [...out, ...tabbablesIn(container).filter((el) => !taken.has(el))];
}

export function useBoardTabOrder(
  containerRef: RefObject<HTMLElement | null>,
  nodeIds: readonly string[],
  edgeIds: readonly string[],
  onNodeFocus?: (id: string) => void,
) {
  useEffect(() => {
    const onKeyDown = (event: KeyboardEvent) => {
      const container = containerRef.current;
      if (event.key !== 'Tab' || event.defaultPrevented || event.altKey || event.ctrlKey || event.metaKey || !container) return;
      if (document.querySelector('dialog[open]')) return;
      const active = document.activeElement;
      const page = tabbablesIn(document);
      const index = active ? page.indexOf(active as HTMLElement) : -1;
      if (index === -1) return;
      const inBoard = (el: Element | undefined) => Boolean(el && container.contains(el));
      const defaultNext = page[index + (event.shiftKey ? -1 : 1)];
      // Only Tabs into, within or out of the board are ours.
      if (!inBoard(active ?? undefined) && !inBoard(defaultNext)) return;
      const stops = boardStops(container, nodeIds, edgeIds);
      const first = page.findIndex((el) => inBoard(el));
      const order = [...page.slice(0, first).filter((el) => !inBoard(el)), ...stops, ...page.slice(first).filter((el) => !inBoard(el))];
      const at = order.indexOf(active as HTMLElement);
      const next = at === -1 ? undefined : order[at + (event.shiftKey ? -1 : 1)];
      if (!next) return;
      event.preventDefault();
      // The board pans to a step instead of letting the browser scroll React Flow's clipped pane.
      next.focus({ preventScroll: inBoard(next) });
      const nodeId = next.classList.contains('react-flow__node') ? next.getAttribute('data-id') : null;
      if (nodeId) onNodeFocus?.(nodeId);
    };
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, [containerRef, nodeIds, edgeIds, onNodeFocus]);
}
