'use client';

import { memo, useEffect, useMemo } from 'react';
import { Handle, Position, useUpdateNodeInternals, type NodeProps } from 'reactflow';
import { EquationText } from '@/components/chemistry/equation-text';
import { FormulaText } from '@/components/chemistry/formula-text';
import { hasDrawing, namesOf, type StepStructures } from '@/components/chemistry/structure-brief';
import { StructureStrip } from '@/components/chemistry/structure-strip';
import type { StepClass } from '@/lib/thermo/route';
import { ESTIMATE_GLYPH } from '../ladder/ladder-uncertainty';
import { NodeClassBadge } from './class-badge';

export interface StepNodeData {
  label: string;
  equation: string;
  reactants: string[];
  products: string[];
  temperatureText: string;
  /** "ΔG" at the step's conditions, or "ΔG°" when it gives none */
  deltaGName: string;
  deltaGText: string;
  cls: StepClass | null;
  signUncertain: boolean;
  /** "sign uncertain: |ΔG| ≤ σ = … kJ/mol" when the data cannot decide the sign ("" otherwise) */
  signUncertainText: string;
  /** "uses estimated values for … (method); σ(ΔrG°) …" ("" when every value is tabulated) */
  estimatedText: string;
  /** open flags and unresolved comments, in words ("" when none) */
  reviewText: string;
  hasFlags: boolean;
  /** the step's species from its evaluation (names, formulas, SMILES, origins); null before the first answer */
  structures: StepStructures | null;
  /** edited since its result: no class or ΔG is shown until the new answer */
  isStale?: boolean;
  /** why the step could not be evaluated, naming the cause ("unknown species", "check temperature"); "" when it was */
  problemLabel?: string;
  /** the engine's message for it, in words ("" when none) */
  problemText?: string;
}

export const reactantHandleId = (species: string) => `r:${species}`;
export const productHandleId = (species: string) => `p:${species}`;
export const speciesOfHandle = (handleId: string | null | undefined) => (handleId ? handleId.slice(2) : null);

const BORDER: Record<StepClass, string> = {
  downhill: 'border-l-downhill',
  marginal: 'border-l-marginal',
  uphill: 'border-l-uphill',
  error: 'border-l-ink-faint',
};

const HANDLE_CLASS = '!h-2.5 !w-2.5 !border-2 !border-white !bg-pine-500';

function StepNodeView({ id, data, selected }: NodeProps<StepNodeData>) {
  const updateNodeInternals = useUpdateNodeInternals();
  const handleKey = `${data.reactants.join('|')}>${data.products.join('|')}`;
  // Handles follow the equation; React Flow must re-measure them when the species change.
  useEffect(() => updateNodeInternals(id), [id, handleKey, updateNodeInternals]);
  const names = useMemo(() => namesOf(data.structures), [data.structures]);

  return (
    <div
      className={`w-64 rounded-md border border-l-4 bg-white text-xs shadow-sm ${data.cls ? BORDER[data.cls] : 'border-l-paper-edge'} ${
        selected ? 'border-brass-500 ring-2 ring-brass-500/60' : 'border-paper-edge'
      }`}
      data-testid="step-node"
    >
      <div className="flex items-center justify-between gap-2 border-b border-paper-edge px-2 py-1">
        <span className="font-semibold text-ink-soft">{data.label}</span>
        {data.isStale ? (
          <span className="rounded border border-dashed border-paper-edge px-1.5 text-[11px] text-ink-faint" data-testid="step-node-stale">changed · not yet evaluated</span>
        ) : data.problemLabel ? (
          <span className="rounded border border-uphill/40 bg-paper-deep px-1.5 text-[11px] font-semibold text-uphill" data-testid="step-node-problem-label">
            <span aria-hidden="true">! </span>
            {data.problemLabel}
          </span>
        ) : (
          <NodeClassBadge cls={data.cls} signUncertain={data.signUncertain} signUncertainText={data.signUncertainText} />
        )}
      </div>
      {data.reviewText ? (
        <p className={`border-b border-paper-edge px-2 py-0.5 text-[11px] font-medium ${data.hasFlags ? 'bg-brass-100 text-brass-700' : 'text-pine-700'}`} data-testid="step-review-marks">
          {data.reviewText}
        </p>
      ) : null}
      {hasDrawing(data.structures) ? <StructureStrip structures={data.structures} label={data.label} className="mx-2 mt-1.5" /> : null}
      <p className="break-words px-2 py-1.5 text-[12px] leading-snug text-ink" data-testid="step-equation">
        {data.equation ? <EquationText equation={data.equation} names={names} /> : <span className="text-ink-faint">blank step: type an equation</span>}
      </p>
      {data.problemText ? (
        <p className="break-words px-2 pb-1 text-[11px] leading-snug text-uphill" data-testid="step-node-problem">
          {data.problemText}
        </p>
      ) : null}
      <div className="flex justify-between gap-2 px-2 pb-1 text-ink-soft">
        <span>T {data.temperatureText}</span>
        <span className="tabular-nums">
          {data.deltaGName} {data.deltaGText}
          {data.estimatedText ? (
            // The glyph qualifies the number it follows; the words are for screen readers and the hover title.
            <span className="ml-1 rounded-sm border border-dotted border-ink px-0.5 font-semibold text-ink" title={data.estimatedText} data-testid="step-estimate-mark">
              <span aria-hidden="true">{ESTIMATE_GLYPH}</span>
              <span className="sr-only">{`; ${data.estimatedText}`}</span>
            </span>
          ) : null}
        </span>
      </div>
      {data.reactants.length + data.products.length > 0 ? (
        <div className="flex justify-between gap-3 border-t border-paper-edge py-1 text-[10px] text-ink-faint">
          <ul aria-label="Consumes" className="flex flex-col gap-1">
            {data.reactants.map((species) => (
              <li key={species} className="relative pl-2">
                <Handle type="target" id={reactantHandleId(species)} position={Position.Left} className={HANDLE_CLASS} title={`consumes ${names.get(species) ?? species}`} />
                <FormulaText value={species} name={names.get(species) ?? null} />
              </li>
            ))}
          </ul>
          <ul aria-label="Produces" className="flex flex-col items-end gap-1">
            {data.products.map((species) => (
              <li key={species} className="relative pr-2">
                <FormulaText value={species} name={names.get(species) ?? null} />
                <Handle type="source" id={productHandleId(species)} position={Position.Right} className={HANDLE_CLASS} title={`produces ${names.get(species) ?? species}`} />
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}

export const StepNode = memo(StepNodeView);

// Defined once at module level: a new object each render would remount every node.
export const STEP_NODE_TYPES = { step: StepNode };
