'use client';

import { useMemo, useRef } from 'react';
import { MarkerType, type Edge, type Node } from 'reactflow';
import { structuresFromSpecies, structuresKey } from '@/components/chemistry/structure-brief';
import { equationSpecies } from '@/lib/route-editor/equation-species';
import { CAUSE_LABEL, causeOf, messageAtField } from '@/lib/route-editor/step-errors';
import { temperatureKOf } from '@/lib/route-editor/temperature-text';
import type { LinkInput, StepInput } from '@/lib/schemas/route';
import type { RouteStepResult } from '@/lib/thermo/route';
import { reviewMarkText, type ReviewMarksByStep, type StepReviewMarks } from '../review/review-marks';
import { formatEnergy, formatTemperature, type EnergyUnit, type TemperatureUnit } from '../ladder/energy-format';
import { estimateSpoken, stepSignUncertainText } from '../ladder/ladder-uncertainty';
import { productHandleId, reactantHandleId, type StepNodeData } from './step-node';
import { formulaUnicode } from '@/components/chemistry/formula-unicode';

export type NodeSize = { width: number; height: number };

const CLASS_WORD = { downhill: 'downhill', marginal: 'marginal', uphill: 'uphill', error: 'not evaluated' } as const;

/** What a screen reader says for a node: "Step 2 (amide formation): ΔG −35.2 kJ/mol, downhill", then any caveats. */
export function nodeSpokenName(title: string, data: StepNodeData, hasResult: boolean): string {
  const parts: string[] = [];
  if (!data.equation) parts.push('blank step, type an equation');
  else if (data.isStale) parts.push('changed, not yet evaluated');
  else if (data.problemText) parts.push(`not evaluated, ${data.problemLabel || 'see the step'}: ${data.problemText}`);
  else if (data.cls && data.cls !== 'error') parts.push(`${data.deltaGName} ${data.deltaGText}, ${CLASS_WORD[data.cls]}${data.signUncertain ? ', sign uncertain' : ''}`);
  else parts.push(hasResult ? 'not evaluated' : 'evaluating');
  if (data.temperatureText) parts.push(`at ${data.temperatureText}`);
  if (data.estimatedText) parts.push(data.estimatedText);
  if (data.reviewText) parts.push(data.reviewText);
  return `${title}: ${parts.join('; ')}`;
}

// A stale step (edited since its result) shows no class or ΔG: the old figures must not read as current.
function nodeData(step: StepInput, label: string, evaluated: RouteStepResult | undefined, isStale: boolean, marks: StepReviewMarks | undefined, energyUnit: EnergyUnit, temperatureUnit: TemperatureUnit): StepNodeData {
  const { reactants, products } = equationSpecies(step.equation);
  const result = isStale ? undefined : evaluated;
  const T = result?.result?.temperature_K ?? temperatureKOf(step.temperature);
  const engine = result?.result ?? null;
  const error = result?.error ?? null;
  const deltaG = engine ? (engine.deltaG_kJ ?? engine.deltaG0_kJ) : null;
  return {
    label,
    equation: step.equation,
    reactants,
    products,
    temperatureText: T === null ? (step.temperature ?? '') : formatTemperature(T, temperatureUnit),
    deltaGName: engine && engine.deltaG_kJ === null ? 'ΔG°' : 'ΔG',
    deltaGText: formatEnergy(deltaG, energyUnit, { perMol: true }),
    cls: result?.class ?? null,
    signUncertain: result?.signUncertain ?? false,
    signUncertainText: result?.signUncertain && engine ? stepSignUncertainText(engine.uncertainty.deltaG0_kJ, energyUnit) : '',
    estimatedText: estimateSpoken(engine, energyUnit) ?? '',
    reviewText: reviewMarkText(marks),
    hasFlags: (marks?.flags ?? 0) > 0,
    // Drawings stay through an edit (they follow the species, not the figures) so the node does not flicker.
    structures: evaluated?.result && evaluated.result.species.length ? structuresFromSpecies(evaluated.result.species) : null,
    isStale,
    problemLabel: error ? CAUSE_LABEL[causeOf(error)] : '',
    problemText: error ? messageAtField(error) : '',
  };
}

function sameData(a: StepNodeData, b: StepNodeData): boolean {
  return (
    a.label === b.label &&
    a.equation === b.equation &&
    a.temperatureText === b.temperatureText &&
    a.deltaGName === b.deltaGName &&
    a.deltaGText === b.deltaGText &&
    a.cls === b.cls &&
    a.signUncertain === b.signUncertain &&
    a.signUncertainText === b.signUncertainText &&
    a.estimatedText === b.estimatedText &&
    a.reviewText === b.reviewText &&
    a.isStale === b.isStale &&
    a.problemText === b.problemText &&
    structuresKey(a.structures) === structuresKey(b.structures) &&
    a.reactants.join('|') === b.reactants.join('|') &&
    a.products.join('|') === b.products.join('|')
  );
}

interface CachedNode {
  step: StepInput;
  result: RouteStepResult | undefined;
  isStale: boolean;
  marks: StepReviewMarks | undefined;
  label: string;
  data: StepNodeData;
}

// Keeps each node's data object while its inputs are unchanged, so dragging one of 200 nodes re-renders one.
export function useStepNodes({
  steps,
  results,
  selectedStepId,
  sizes,
  stepLabels,
  energyUnit,
  temperatureUnit,
  reviewMarks,
  stale,
  stepTitles,
  order,
}: {
  reviewMarks?: ReviewMarksByStep;
  /** steps edited since their result was computed */
  stale?: ReadonlySet<string>;
  steps: StepInput[];
  stepLabels: Record<string, string>;
  /** "Step 2 (methanol from carbon monoxide)", for screen readers */
  stepTitles?: Record<string, string>;
  /** step ids in route order: the nodes follow it in the page, so Tab and screen readers meet them in that order */
  order?: readonly string[];
  results: Map<string, RouteStepResult>;
  selectedStepId: string | null;
  sizes: Record<string, NodeSize>;
  energyUnit: EnergyUnit;
  temperatureUnit: TemperatureUnit;
}): Node<StepNodeData>[] {
  const cache = useRef({ energyUnit, temperatureUnit, byId: new Map<string, CachedNode>() });
  return useMemo(() => {
    const previous = cache.current.energyUnit === energyUnit && cache.current.temperatureUnit === temperatureUnit ? cache.current.byId : new Map<string, CachedNode>();
    const byId = new Map<string, CachedNode>();
    const rank = new Map((order ?? []).map((id, i) => [id, i]));
    const nodes = steps.map((step, index) => {
      const result = results.get(step.id);
      const isStale = stale?.has(step.id) ?? false;
      const marks = reviewMarks?.[step.id];
      const label = stepLabels[step.id] ?? `Step ${(rank.get(step.id) ?? index) + 1}`;
      const hit = previous.get(step.id);
      let data: StepNodeData;
      if (hit && hit.result === result && hit.isStale === isStale && hit.marks === marks && hit.label === label && (hit.step === step || hit.step.equation === step.equation && hit.step.temperature === step.temperature)) {
        data = hit.data;
      } else {
        const fresh = nodeData(step, label, result, isStale, marks, energyUnit, temperatureUnit);
        data = hit && sameData(hit.data, fresh) ? hit.data : fresh;
      }
      byId.set(step.id, { step, result, isStale, marks, label, data });
      const size = sizes[step.id];
      return {
        id: step.id,
        type: 'step',
        position: step.position,
        data,
        selected: step.id === selectedStepId,
        deletable: false,
        ariaLabel: nodeSpokenName(stepTitles?.[step.id] ?? data.label, data, result !== undefined),
        ...(size ? { width: size.width, height: size.height } : {}),
      } satisfies Node<StepNodeData>;
    });
    cache.current = { energyUnit, temperatureUnit, byId };
    return order ? nodes.sort((a, b) => (rank.get(a.id) ?? nodes.length) - (rank.get(b.id) ?? nodes.length)) : nodes;
  }, [steps, results, stale, reviewMarks, selectedStepId, sizes, stepLabels, stepTitles, order, energyUnit, temperatureUnit]);
}

export const linkEdgeId = (link: LinkInput) => `${link.from}>${link.to}:${link.species}`;

const ARROW_END = { type: MarkerType.ArrowClosed, width: 16, height: 16 };
// Edge labels are read, not typed: the species typeset in Unicode (SVG text takes no <sub>), in the body face.
const LABEL_STYLE = { fontSize: 10 };
const DANGLING_STYLE = { strokeDasharray: '4 3' };

/** Edges in route order of their steps (so Tab meets them that way), each named in words for screen readers. */
export function useLinkEdges(links: LinkInput[], steps: StepInput[], selectedEdgeId: string | null, stepTitles?: Record<string, string>, order?: readonly string[]): Edge[] {
  // Edges depend on equations, not positions: a drag must not rebuild every edge.
  const equationsKey = steps.map((s) => `${s.id}\u0000${s.equation}`).join('\u0001');
  return useMemo(() => {
    const speciesOf = new Map(
      equationsKey
        .split('\u0001')
        .filter(Boolean)
        .map((entry) => {
          const [id = '', equation = ''] = entry.split('\u0000');
          return [id, equationSpecies(equation)] as const;
        }),
    );
    const rank = new Map((order ?? []).map((id, i) => [id, i]));
    const at = (id: string) => rank.get(id) ?? rank.size;
    const sorted = order ? [...links].sort((a, b) => at(a.from) - at(b.from) || at(a.to) - at(b.to)) : links;
    return sorted.map((link) => {
      const id = linkEdgeId(link);
      // A link whose species left the equation still shows, from the node's first handle; the route warnings name it.
      const hasSource = speciesOf.get(link.from)?.products.includes(link.species) ?? false;
      const hasTarget = speciesOf.get(link.to)?.reactants.includes(link.species) ?? false;
      return {
        id,
        source: link.from,
        target: link.to,
        sourceHandle: hasSource ? productHandleId(link.species) : null,
        targetHandle: hasTarget ? reactantHandleId(link.species) : null,
        label: formulaUnicode(link.species),
        selected: id === selectedEdgeId,
        markerEnd: ARROW_END,
        labelStyle: LABEL_STYLE,
        style: hasSource && hasTarget ? undefined : DANGLING_STYLE,
        data: link,
        ariaLabel: `Link: ${link.species} from ${stepTitles?.[link.from] ?? 'a removed step'} to ${stepTitles?.[link.to] ?? 'a removed step'}${hasSource && hasTarget ? '' : ' (the species is no longer in both equations)'}`,
      } satisfies Edge<LinkInput>;
    });
  }, [links, equationsKey, selectedEdgeId, stepTitles, order]);
}
