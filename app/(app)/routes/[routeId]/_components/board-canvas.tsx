'use client';

import type { ComponentProps } from 'react';
import { RouteCanvas } from '@/components/canvas/route-canvas';
import { useRouteEditorStore } from '@/stores/route-editor-store';
import { LinkSuggestions } from './link-suggestions';

type Props = Omit<ComponentProps<typeof RouteCanvas>, 'steps' | 'links' | 'selectedStepId'>;

// The only part of the editor that follows every store update (a drag is one per frame).
export function BoardCanvas(props: Props) {
  const steps = useRouteEditorStore((s) => s.doc.steps);
  const links = useRouteEditorStore((s) => s.doc.links);
  const selectedStepId = useRouteEditorStore((s) => s.selectedStepId);
  return (
    <div className="relative h-full w-full">
      <RouteCanvas {...props} steps={steps} links={links} selectedStepId={selectedStepId} />
      {/* Over the canvas, after it in the page: it never shifts the board, and Tab meets it after the board's stops. */}
      <div aria-live="polite">{props.isReadOnly ? null : <LinkSuggestions />}</div>
    </div>
  );
}
