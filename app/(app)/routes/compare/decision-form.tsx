'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextAreaField } from '@/components/ui/text-area-field';
import type { ComparedRoute } from '@/lib/compare/compare-types';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { recordDecision } from '@/lib/queries/compare';
import { decisionKeys } from '@/lib/queries/decisions';
import type { WhatIf } from '@/lib/schemas/compare';
import { MAX_RATIONALE } from '@/lib/schemas/decision';

const DecisionForm = z.object({
  chosenRouteId: z.string({ message: 'Choose the route to go on with.' }).regex(/^\d+$/, { message: 'Choose the route to go on with.' }),
  rationale: z.string().trim().min(1, { message: 'Say why this route was chosen.' }).max(MAX_RATIONALE, { message: `A rationale is at most ${MAX_RATIONALE.toLocaleString('en')} characters.` }),
  shelveOthers: z.boolean(),
});
type DecisionValues = z.infer<typeof DecisionForm>;

// The lead's record of which route the group goes on with; saved with the compared metrics, never edited.
export function RecordDecision({ routes, whatIf }: { routes: ComparedRoute[]; whatIf: WhatIf }) {
  const queryClient = useQueryClient();
  const [saved, setSaved] = useState<{ id: number; caution: string } | null>(null);
  const [banner, setBanner] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<DecisionValues>({
    resolver: zodResolver(DecisionForm),
    defaultValues: { chosenRouteId: '', rationale: '', shelveOthers: false },
  });

  const submit = handleSubmit(async (values) => {
    setBanner(null);
    try {
      const answer = await recordDecision({
        routeIds: routes.map((r) => r.id),
        chosenRouteId: Number(values.chosenRouteId),
        rationale: values.rationale,
        shelveOthers: values.shelveOthers,
        ...(Object.keys(whatIf).length ? { whatIf } : {}),
      });
      setSaved({ id: answer.decision.id, caution: answer.caution });
      await Promise.all([queryClient.invalidateQueries({ queryKey: ['compare'] }), queryClient.invalidateQueries({ queryKey: decisionKeys.all })]);
    } catch (error) {
      setBanner(applyServerErrors(error, setError, ['chosenRouteId', 'rationale']));
    }
  });

  if (saved) {
    return (
      <Notice tone="success" title={`Decision #${saved.id} recorded.`}>
        It is in the team’s <Link href="/decisions" className="underline">decision log</Link>. {saved.caution}
      </Notice>
    );
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label="Record the decision">
      <fieldset className="flex flex-col gap-1">
        <legend className="text-sm font-medium">Go on with</legend>
        {routes.map((r) => (
          <label key={r.id} className="flex items-center gap-2 text-sm">
            <input type="radio" value={String(r.id)} {...register('chosenRouteId')} /> {r.name}
          </label>
        ))}
        {formState.errors.chosenRouteId ? <p className="text-xs text-uphill">{formState.errors.chosenRouteId.message}</p> : null}
      </fieldset>
      <TextAreaField label="Rationale" rows={4} maxLength={MAX_RATIONALE} error={formState.errors.rationale?.message} hint="What tipped it: the climbs, the flags, cost or supply. Saved with the numbers above." {...register('rationale')} />
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" {...register('shelveOthers')} /> Shelve the other routes
      </label>
      {banner ? <Notice tone="error">{banner}</Notice> : null}
      <div>
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Recording…' : 'Record decision'}
        </Button>
      </div>
    </form>
  );
}
