'use client';

import type { ComponentProps } from 'react';
import { RouteCanvas } from '@/components/canvas/route-canvas';
import { useRouteEditorStore } from '@/stores/route-editor-store';

type Props = Omit<ComponentProps<typeof RouteCanvas>, 'steps' | 'links' | 'selectedStepId'>;

// The only part of the editor that follows every store update (a drag is one per frame).
export function BoardCanvas(props: Props) {
  const steps = useRouteEditorStore((s) => s.doc.steps);
  const links = useRouteEditorStore((s) => s.doc.links);
  const selectedStepId = useRouteEditorStore((s) => s.selectedStepId);
  return <RouteCanvas {...props} steps={steps} links={links} selectedStepId={selectedStepId} />;
}
