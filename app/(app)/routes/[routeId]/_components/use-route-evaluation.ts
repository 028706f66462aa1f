'use client';

import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { routeEvaluationQuery, type RouteEvaluationAnswer } from '@/lib/queries/routes';
import { engineFingerprint, staleStepIds } from '@/lib/route-editor/route-draft';
import type { RouteDraft } from '@/lib/schemas/route';
import type { RouteStepResult } from '@/lib/thermo/route';
import { useSettledDoc } from './use-settled-doc';

const EVALUATE_DEBOUNCE_MS = 80;

// Evaluates the working draft ~80 ms after it settles (typing pauses are longer); the last good answer stays on screen
// meanwhile, but a step edited since it was computed is marked stale so its old ΔG is never shown as current.
export function useRouteEvaluation(routeId: number) {
  const settled = useSettledDoc(EVALUATE_DEBOUNCE_MS);
  const fingerprint = useMemo(() => engineFingerprint(settled), [settled]);
  const hasSteps = settled.steps.length > 0;
  const query = useQuery({ ...routeEvaluationQuery(routeId, fingerprint, settled), enabled: hasSteps });

  // Adjusting state during render (not in an effect) keeps the previous ladder through an error, with the draft it was for.
  const [lastGood, setLastGood] = useState<{ answer: RouteEvaluationAnswer; doc: RouteDraft } | undefined>(undefined);
  if (query.data && query.data !== lastGood?.answer && !query.isPlaceholderData) setLastGood({ answer: query.data, doc: settled });

  const evaluation = hasSteps ? lastGood?.answer.evaluation : undefined;
  const results = useMemo(() => new Map<string, RouteStepResult>((evaluation?.steps ?? []).map((s) => [s.id, s])), [evaluation]);
  const evaluatedDoc = lastGood?.doc;
  const stale = useMemo(() => (evaluatedDoc ? staleStepIds(settled, evaluatedDoc) : new Set<string>()), [settled, evaluatedDoc]);

  return {
    evaluation,
    results,
    /** steps whose engine fields changed since `results` were computed (re-evaluating, or the last try failed) */
    stale,
    isEvaluating: hasSteps && query.isFetching,
    error: query.isError ? query.error : null,
  };
}
