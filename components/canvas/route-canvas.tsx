'use client';

import 'reactflow/dist/style.css';
import './board-focus.css';
import { useCallback, useMemo, useRef, useState, type DragEvent } from 'react';
import ReactFlow, { Background, Controls, type Connection, type EdgeChange, type NodeChange, type ReactFlowInstance } from 'reactflow';
import { stepLabels as buildStepLabels } from '@/lib/route-editor/step-label';
import type { LinkInput, StepInput } from '@/lib/schemas/route';
import type { RouteStepResult } from '@/lib/thermo/route';
import type { EnergyUnit, TemperatureUnit } from '../ladder/energy-format';
import { placeNewStep } from './place-step';
import { hasStepPayload, readStepPayload, type StepDragPayload } from './step-drop';
import { STEP_NODE_TYPES, speciesOfHandle } from './step-node';
import { useBoardTabOrder } from './use-board-tab-order';
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

  const wrapper = useRef<HTMLDivElement>(null);

  // Numbers, names and order come from the draft (lib/route-editor/step-label.ts), never from an evaluation, so they
  // hold while one loads; strings as memo keys, so a drag frame does not renumber.
  const equationsKey = steps.map((s) => `${s.id}\u0000${s.equation}`).join('\u0001');
  const linksKey = links.map((l) => `${l.from}\u0000${l.to}`).join('\u0001');
  const labels = useMemo(() => {
    const ids = equationsKey.split('\u0001').filter(Boolean).map((entry) => entry.split('\u0000') as [string, string]);
    const pairs = linksKey.split('\u0001').filter(Boolean).map((entry) => entry.split('\u0000') as [string, string]);
    return buildStepLabels(ids.map(([id, equation]) => ({ id, equation })), pairs.map(([from, to]) => ({ from, to })));
  }, [equationsKey, linksKey]);
  const { order, stepLabels, stepTitles } = useMemo(
    () => ({
      order: [...labels.keys()],
      stepLabels: Object.fromEntries([...labels].map(([id, l]) => [id, l.short])),
      stepTitles: Object.fromEntries([...labels].map(([id, l]) => [id, l.full])),
    }),
    [labels],
  );

  const nodes = useStepNodes({ steps, results, stale, selectedStepId, sizes, stepLabels, stepTitles, order, energyUnit, temperatureUnit, reviewMarks });
  const edges = useLinkEdges(links, steps, selectedEdgeId, stepTitles, order);
  const edgeIds = useMemo(() => edges.map((e) => e.id), [edges]);

  // A step reached by Tab beyond the visible pane is brought into view at the current zoom.
  const handleNodeFocus = useCallback((id: string) => {
    const flow = instance.current;
    const box = wrapper.current?.getBoundingClientRect();
    const el = wrapper.current?.querySelector(`.react-flow__node[data-id="${CSS.escape(id)}"]`)?.getBoundingClientRect();
    const node = flow?.getNode(id);
    if (!flow || !box || !el || !node) return;
    if (el.left >= box.left && el.right <= box.right && el.top >= box.top && el.bottom <= box.bottom) return;
    flow.setCenter(node.position.x + (node.width ?? 256) / 2, node.position.y + (node.height ?? 200) / 2, { zoom: flow.getZoom(), duration: 150 });
  }, []);
  useBoardTabOrder(wrapper, order, edgeIds, handleNodeFocus);

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
    // The drop point is the node's top-left corner shifted so the pointer lands near its header; a drop on top of
    // another step slides to the nearest free spot.
    onDropStep(payload, placeNewStep(steps, (id) => sizes[id], { x: point.x - 40, y: point.y - 14 }));
  };

  return (
    <div ref={wrapper} className="stepwell-board relative h-full w-full" onDragOver={handleDragOver} onDrop={handleDrop} data-testid="route-canvas">
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
        nodesFocusable
        edgesFocusable
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
