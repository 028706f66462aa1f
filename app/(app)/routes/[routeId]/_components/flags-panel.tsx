'use client';

import { ChemText } from '@/components/chemistry/chem-text';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { COMPACT_INPUT } from '@/components/ui/input-class';
import { TextAreaField } from '@/components/ui/text-area-field';
import { When } from '@/components/ui/when';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { clearFlag, flagsQuery, raiseFlag } from '@/lib/queries/comments';
import { FLAG_CATEGORY_LABELS } from '@/lib/review/flag-labels';
import { CreateFlagInput, FLAG_CATEGORIES, FLAG_REASON_MAX_CHARS, type FlagDto } from '@/lib/schemas/flag';
import { useRouteEditorStore } from '@/stores/route-editor-store';
import { CommentComposer } from './comment-composer';

const CATEGORY_LABELS = FLAG_CATEGORY_LABELS;

const RaiseForm = CreateFlagInput.pick({ category: true, reason: true });

function RaiseFlagForm({ routeId, stepKey, placeName, onDone }: { routeId: number; stepKey: string; placeName: string; onDone: () => Promise<void> }) {
  const [banner, setBanner] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError, reset } = useForm({ resolver: zodResolver(RaiseForm), defaultValues: { category: 'thermodynamics' as const, reason: '' } });
  const submit = handleSubmit(async (values) => {
    setBanner(null);
    try {
      await raiseFlag(routeId, { stepKey, ...values });
      reset({ category: values.category, reason: '' });
      await onDone();
    } catch (error) {
      setBanner(applyServerErrors(error, setError, ['category', 'reason']));
    }
  });
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-1.5 rounded-md border border-paper-edge p-2" aria-label={`Flag ${placeName}`}>
      <p className="text-xs font-medium">
        Flag <ChemText text={placeName} /> as weak
      </p>
      <label className="flex flex-col gap-1 text-xs font-medium">
        Category
        <select className={COMPACT_INPUT} {...register('category')}>
          {FLAG_CATEGORIES.map((c) => (
            <option key={c} value={c}>
              {CATEGORY_LABELS[c]}
            </option>
          ))}
        </select>
      </label>
      <TextAreaField label="Why is this step weak?" rows={2} maxLength={FLAG_REASON_MAX_CHARS} error={formState.errors.reason?.message} {...register('reason')} />
      {banner ? (
        <p role="alert" className="text-xs text-uphill">
          {banner}
        </p>
      ) : null}
      <div>
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Flagging…' : 'Flag step'}
        </Button>
      </div>
    </form>
  );
}

function FlagItem({ flag, title, canFlag, routeId, onDone }: { flag: FlagDto; title: string; canFlag: boolean; routeId: number; onDone: () => Promise<void> }) {
  const [clearing, setClearing] = useState(false);
  return (
    <li className={`flex flex-col gap-1 rounded-md border p-2 ${flag.isOpen ? 'border-brass-500/50 bg-brass-100/40' : 'border-paper-deep bg-paper'}`} data-testid="flag">
      <p className="text-xs">
        <span className="font-semibold">⚑ {CATEGORY_LABELS[flag.category]}</span> on <ChemText text={title} /> · {flag.createdBy?.name ?? 'Former member'} · <When iso={flag.createdAt} />
      </p>
      <p className="whitespace-pre-wrap text-sm">{flag.reason}</p>
      {flag.isOpen ? null : (
        <p className="text-xs text-downhill">
          ✓ cleared by {flag.clearedBy?.name ?? 'a former member'}
          {flag.clearedAt ? (
            <>
              {' '}
              · <When iso={flag.clearedAt} />
            </>
          ) : null}
        </p>
      )}
      {flag.isOpen && canFlag && !clearing ? (
        <div>
          <Button variant="secondary" className="!py-0.5 text-xs" onClick={() => setClearing(true)}>
            Clear flag…
          </Button>
        </div>
      ) : null}
      {clearing ? (
        <CommentComposer
          label="Why is the flag cleared? (posted as a comment on the step)"
          submitLabel="Clear flag"
          onSubmit={async (comment) => {
            await clearFlag(routeId, flag.id, comment);
            setClearing(false);
            await onDone();
          }}
          onCancel={() => setClearing(false)}
        />
      ) : null}
    </li>
  );
}

// Weak-step flags: raise one on the selected step; clear one with a comment saying why.
export function FlagsPanel({ routeId, canFlag, stepLabels, refresh }: { routeId: number; canFlag: boolean; stepLabels: Record<string, string>; refresh: () => Promise<void> }) {
  const selectedStepId = useRouteEditorStore((s) => s.selectedStepId);
  const [showCleared, setShowCleared] = useState(false);
  const query = useQuery(flagsQuery(routeId, showCleared ? 'all' : 'open'));
  const titleOf = (key: string) => stepLabels[key] ?? 'a removed step';
  return (
    <div className="flex flex-col gap-3">
      <label className="flex items-center gap-1 text-xs">
        <input type="checkbox" checked={showCleared} onChange={(e) => setShowCleared(e.target.checked)} /> Show cleared flags
      </label>
      {query.isPending ? <p className="text-sm text-ink-faint">Loading flags…</p> : null}
      {query.isError ? <p role="alert" className="text-sm text-uphill">Could not load flags: {query.error.message}</p> : null}
      {query.data && query.data.flags.length === 0 ? <p className="text-sm text-ink-faint">{showCleared ? 'No flags on this route.' : 'No open flags.'}</p> : null}
      {query.data?.flags.length ? (
        <ul className="flex flex-col gap-2">
          {query.data.flags.map((f) => (
            <FlagItem key={f.id} flag={f} title={titleOf(f.stepKey)} canFlag={canFlag} routeId={routeId} onDone={refresh} />
          ))}
        </ul>
      ) : null}
      {canFlag ? (
        selectedStepId ? (
          <RaiseFlagForm routeId={routeId} stepKey={selectedStepId} placeName={titleOf(selectedStepId)} onDone={refresh} />
        ) : (
          <p className="text-xs text-ink-faint">Select a step on the board or the ladder to flag it.</p>
        )
      ) : null}
    </div>
  );
}
