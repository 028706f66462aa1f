'use client';

import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { routeEvaluationQuery, type RouteEvaluationAnswer } from '@/lib/queries/routes';
import { engineFingerprint } from '@/lib/route-editor/route-draft';
import type { RouteStepResult } from '@/lib/thermo/route';
import { useSettledDoc } from './use-settled-doc';

const EVALUATE_DEBOUNCE_MS = 80;

// Evaluates the working draft ~80 ms after it settles (typing pauses are longer); the last good answer stays on screen meanwhile.
export function useRouteEvaluation(routeId: number) {
  const settled = useSettledDoc(EVALUATE_DEBOUNCE_MS);
  const fingerprint = useMemo(() => engineFingerprint(settled), [settled]);
  const hasSteps = settled.steps.length > 0;
  const query = useQuery({ ...routeEvaluationQuery(routeId, fingerprint, settled), enabled: hasSteps });

  // Adjusting state during render (not in an effect) keeps the previous ladder through an error.
  const [lastGood, setLastGood] = useState<RouteEvaluationAnswer | undefined>(undefined);
  if (query.data && query.data !== lastGood && !query.isPlaceholderData) setLastGood(query.data);

  const evaluation = hasSteps ? (query.data ?? lastGood)?.evaluation : undefined;
  const results = useMemo(() => new Map<string, RouteStepResult>((evaluation?.steps ?? []).map((s) => [s.id, s])), [evaluation]);

  return {
    evaluation,
    results,
    isEvaluating: hasSteps && query.isFetching,
    error: query.isError ? query.error : null,
  };
}
