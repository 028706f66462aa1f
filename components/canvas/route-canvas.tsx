'use client';

import 'reactflow/dist/style.css';
import { useCallback, useRef, useState, type DragEvent } from 'react';
import ReactFlow, { Background, Controls, type Connection, type EdgeChange, type NodeChange, type ReactFlowInstance } from 'reactflow';
import type { LinkInput, StepInput } from '@/lib/schemas/route';
import type { RouteStepResult } from '@/lib/thermo/route';
import type { EnergyUnit, TemperatureUnit } from '../ladder/energy-format';
import { hasStepPayload, readStepPayload, type StepDragPayload } from './step-drop';
import { STEP_NODE_TYPES, speciesOfHandle } from './step-node';
import { useLinkEdges, useStepNodes, type NodeSize } from './use-step-nodes';
import type { ReviewMarksByStep } from '../review/review-marks';

export interface LinkAttempt {
  from: string;
  to: string;
  fromSpecies: string;
  toSpecies: string;
}

const FIT_OPTIONS = { padding: 0.2, maxZoom: 1.25 };
const PRO_OPTIONS = { hideAttribution: true };

export function RouteCanvas({
  steps,
  links,
  results,
  selectedStepId,
  stepLabels,
  energyUnit,
  temperatureUnit,
  isReadOnly,
  onSelectStep,
  onMoveStep,
  onLink,
  onRemoveLink,
  onDropStep,
  onInit,
  reviewMarks,
  stale,
}: {
  /** open flags and unresolved comments per step, shown on the nodes */
  reviewMarks?: ReviewMarksByStep;
  /** steps edited since their result was computed: their nodes show no class or ΔG */
  stale?: ReadonlySet<string>;
  steps: StepInput[];
  links: LinkInput[];
  results: Map<string, RouteStepResult>;
  selectedStepId: string | null;
  stepLabels: Record<string, string>;
  energyUnit: EnergyUnit;
  temperatureUnit: TemperatureUnit;
  isReadOnly: boolean;
  onSelectStep: (id: string | null) => void;
  onMoveStep: (id: string, position: StepInput['position'] | undefined, dragging: boolean) => void;
  /** returns why the link was refused, or null when it was made */
  onLink: (attempt: LinkAttempt) => string | null;
  onRemoveLink: (link: LinkInput) => void;
  onDropStep: (payload: StepDragPayload, position: StepInput['position']) => void;
  onInit?: (instance: ReactFlowInstance) => void;
}) {
  const instance = useRef<ReactFlowInstance | null>(null);
  const [sizes, setSizes] = useState<Record<string, NodeSize>>({});
  const [selectedEdgeId, setSelectedEdgeId] = useState<string | null>(null);
  const [refusal, setRefusal] = useState<string | null>(null);
  // Fit once on load; an empty board keeps a 1:1 view, so the first drop does not jump the viewport.
  const [shouldFitOnLoad] = useState(() => steps.length > 0);

  const nodes = useStepNodes({ steps, results, stale, selectedStepId, sizes, stepLabels, energyUnit, temperatureUnit, reviewMarks });
  const edges = useLinkEdges(links, steps, selectedEdgeId);

  const handleNodesChange = useCallback(
    (changes: NodeChange[]) => {
      const measured: Record<string, NodeSize> = {};
      for (const change of changes) {
        if (change.type === 'position') onMoveStep(change.id, change.position, Boolean(change.dragging));
        else if (change.type === 'dimensions' && change.dimensions) measured[change.id] = change.dimensions;
        else if (change.type === 'select' && change.selected) {
          setSelectedEdgeId(null);
          onSelectStep(change.id);
        }
      }
      if (Object.keys(measured).length > 0) setSizes((previous) => ({ ...previous, ...measured }));
    },
    [onMoveStep, onSelectStep],
  );

  const handleEdgesChange = useCallback(
    (changes: EdgeChange[]) => {
      for (const change of changes) {
        if (change.type === 'select') {
          setSelectedEdgeId((current) => (change.selected ? change.id : current === change.id ? null : current));
          if (change.selected) onSelectStep(null);
        }
      }
    },
    [onSelectStep],
  );

  const handleConnect = useCallback(
    (connection: Connection) => {
      const fromSpecies = speciesOfHandle(connection.sourceHandle);
      const toSpecies = speciesOfHandle(connection.targetHandle);
      if (!connection.source || !connection.target || !fromSpecies || !toSpecies) return;
      setRefusal(onLink({ from: connection.source, to: connection.target, fromSpecies, toSpecies }));
    },
    [onLink],
  );

  const handleDragOver = (event: DragEvent) => {
    if (isReadOnly || !hasStepPayload(event.dataTransfer)) return;
    event.preventDefault();
    event.dataTransfer.dropEffect = 'copy';
  };

  const handleDrop = (event: DragEvent) => {
    const payload = readStepPayload(event.dataTransfer);
    if (isReadOnly || !payload || !instance.current) return;
    event.preventDefault();
    const point = instance.current.screenToFlowPosition({ x: event.clientX, y: event.clientY });
    // The drop point is the node's top-left corner shifted so the pointer lands near its header.
    onDropStep(payload, { x: Math.round(point.x - 40), y: Math.round(point.y - 14) });
  };

  return (
    <div className="relative h-full w-full" onDragOver={handleDragOver} onDrop={handleDrop} data-testid="route-canvas">
      <ReactFlow
        nodes={nodes}
        edges={edges}
        nodeTypes={STEP_NODE_TYPES}
        onNodesChange={handleNodesChange}
        onEdgesChange={handleEdgesChange}
        onEdgesDelete={(deleted) => deleted.forEach((edge) => onRemoveLink(edge.data as LinkInput))}
        onConnect={handleConnect}
        onConnectStart={() => setRefusal(null)}
        onPaneClick={() => {
          setSelectedEdgeId(null);
          onSelectStep(null);
        }}
        onInit={(flow) => {
          instance.current = flow;
          onInit?.(flow);
        }}
        nodesDraggable={!isReadOnly}
        nodesConnectable={!isReadOnly}
        edgesUpdatable={false}
        elementsSelectable
        selectionOnDrag={false}
        multiSelectionKeyCode={null}
        deleteKeyCode={isReadOnly ? null : ['Delete', 'Backspace']}
        fitView={shouldFitOnLoad}
        fitViewOptions={FIT_OPTIONS}
        minZoom={0.1}
        proOptions={PRO_OPTIONS}
      >
        <Background gap={24} color="#d8d2c2" />
        <Controls showInteractive={false} />
      </ReactFlow>
      <div aria-live="assertive" className="pointer-events-none absolute inset-x-0 top-2 flex justify-center">
        {refusal ? (
          <p role="alert" className="pointer-events-auto rounded-md border border-uphill/40 bg-uphill-bg px-3 py-1.5 text-sm text-uphill shadow">
            {refusal}
            <button type="button" className="ml-2 underline" onClick={() => setRefusal(null)}>
              Dismiss
            </button>
          </p>
        ) : null}
      </div>
      {steps.length === 0 ? (
        <p className="pointer-events-none absolute inset-0 flex items-center justify-center text-sm text-ink-faint">
          {isReadOnly ? 'This route has no steps yet.' : 'Drag a step here from the palette, or use its Add buttons.'}
        </p>
      ) : null}
    </div>
  );
}
