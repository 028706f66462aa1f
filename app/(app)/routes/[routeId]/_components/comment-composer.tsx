'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useRef, useState, type KeyboardEvent } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { COMPACT_INPUT } from '@/components/ui/input-class';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { insertMention, mentionCandidates, mentionQueryAt, type MentionCandidate, type MentionQuery } from '@/lib/review/mention-complete';
import { CommentBody, COMMENT_MAX_CHARS } from '@/lib/schemas/comment';

const ComposerForm = z.object({ body: CommentBody });
type ComposerValues = z.infer<typeof ComposerForm>;

export const COMMENT_HINT = 'Markdown: *emphasis*, **strong**, `code`, lists and > quotes. Type @ and a colleague’s name to mention them.';

const LIMIT_TEXT = COMMENT_MAX_CHARS.toLocaleString('en');

// One text box for a new thread, a reply or an edit; the same rules as the server (1–10,000 characters, counted after
// trimming). No maxLength on the box: a browser would cut a long paste silently; the counter and the form refuse it instead.
export function CommentComposer({
  label,
  submitLabel,
  initial = '',
  handles = [],
  onSubmit,
  onCancel,
}: {
  label: string;
  submitLabel: string;
  initial?: string;
  /** team members offered when "@" is typed */
  handles?: ReadonlyArray<MentionCandidate>;
  onSubmit: (body: string) => Promise<void>;
  onCancel?: () => void;
}) {
  const id = useId();
  const [banner, setBanner] = useState<string | null>(null);
  const box = useRef<HTMLTextAreaElement | null>(null);
  const [mention, setMention] = useState<{ at: MentionQuery; options: MentionCandidate[]; active: number } | null>(null);
  const { register, handleSubmit, formState, setError, reset, setValue, watch } = useForm<ComposerValues>({
    resolver: zodResolver(ComposerForm),
    defaultValues: { body: initial },
  });
  const count = (watch('body') ?? '').trim().length;
  const isOver = count > COMMENT_MAX_CHARS;

  const submit = handleSubmit(async ({ body }) => {
    setBanner(null);
    try {
      await onSubmit(body);
      reset({ body: '' });
    } catch (error) {
      setBanner(applyServerErrors(error, setError, ['body']));
    }
  });

  // After every change or caret move: is an "@name" being typed, and who fits it?
  const follow = (el: HTMLTextAreaElement) => {
    const at = el.selectionStart === el.selectionEnd ? mentionQueryAt(el.value, el.selectionStart) : null;
    const options = at ? mentionCandidates(handles, at.query) : [];
    setMention(at && options.length ? { at, options, active: 0 } : null);
  };

  const choose = (handle: string) => {
    const el = box.current;
    if (!el || !mention) return;
    const done = insertMention(el.value, mention.at, el.selectionStart, handle);
    setValue('body', done.text, { shouldDirty: true, shouldValidate: formState.isSubmitted });
    setMention(null);
    el.focus();
    // The value is set through the form; place the caret once React has written it.
    requestAnimationFrame(() => el.setSelectionRange(done.caret, done.caret));
  };

  const onKeyDown = (event: KeyboardEvent<HTMLTextAreaElement>) => {
    if (!mention) return;
    const n = mention.options.length;
    if (event.key === 'ArrowDown' || event.key === 'ArrowUp') {
      event.preventDefault();
      setMention({ ...mention, active: (mention.active + (event.key === 'ArrowDown' ? 1 : n - 1)) % n });
    } else if (event.key === 'Enter' || event.key === 'Tab') {
      event.preventDefault();
      choose(mention.options[mention.active]!.handle);
    } else if (event.key === 'Escape') {
      event.preventDefault();
      setMention(null);
    }
  };

  const field = register('body', { onChange: (e: { target: HTMLTextAreaElement }) => follow(e.target) });
  const listId = `${id}-mentions`;
  const optionId = (i: number) => `${id}-mention-${i}`;
  const error = formState.errors.body?.message;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-1.5">
      <div className="relative flex flex-col gap-1">
        <label htmlFor={`${id}-body`} className="sr-only">
          {label}
        </label>
        <textarea
          {...field}
          ref={(el) => {
            field.ref(el);
            box.current = el;
          }}
          id={`${id}-body`}
          rows={3}
          placeholder={label}
          role="combobox"
          aria-autocomplete="list"
          aria-expanded={mention ? true : false}
          aria-controls={listId}
          aria-activedescendant={mention ? optionId(mention.active) : undefined}
          aria-invalid={error || isOver ? true : undefined}
          aria-describedby={`${id}-count ${error ? `${id}-error` : `${id}-hint`}`}
          className={`${COMPACT_INPUT} ${error || isOver ? 'border-uphill' : ''}`}
          onKeyDown={onKeyDown}
          onClick={(e) => follow(e.currentTarget)}
          onKeyUp={(e) => {
            if (e.key === 'ArrowLeft' || e.key === 'ArrowRight' || e.key === 'Home' || e.key === 'End') follow(e.currentTarget);
          }}
          onBlur={(e) => {
            setMention(null);
            void field.onBlur(e);
          }}
        />
        <ul
          id={listId}
          role="listbox"
          aria-label="Mention a colleague"
          hidden={!mention}
          className="absolute bottom-full left-0 z-20 mb-0.5 max-h-48 w-64 overflow-auto rounded-md border border-paper-edge bg-white py-1 text-sm shadow-lg"
        >
          {mention?.options.map((m, i) => (
            <li
              key={m.handle}
              id={optionId(i)}
              role="option"
              aria-selected={i === mention.active}
              className={`cursor-pointer px-2 py-1 ${i === mention.active ? 'bg-pine-50 text-pine-700' : ''}`}
              // mousedown, not click: the box must not lose focus (which closes the list) before the choice lands.
              onMouseDown={(e) => {
                e.preventDefault();
                choose(m.handle);
              }}
            >
              {m.name} <span className="text-xs text-ink-faint">@{m.handle}</span>
            </li>
          ))}
        </ul>
        <div className="flex items-start justify-between gap-2 text-xs">
          {error ? (
            <p id={`${id}-error`} className="text-uphill">
              {error}
            </p>
          ) : (
            <p id={`${id}-hint`} className="text-ink-faint">
              {COMMENT_HINT}
            </p>
          )}
          <p id={`${id}-count`} data-testid="comment-count" className={`shrink-0 tabular-nums ${isOver ? 'font-semibold text-uphill' : 'text-ink-faint'}`}>
            {count.toLocaleString('en')} / {LIMIT_TEXT}
            {isOver ? ` (${(count - COMMENT_MAX_CHARS).toLocaleString('en')} too many)` : ''}
          </p>
        </div>
      </div>
      {banner ? (
        <p role="alert" className="text-xs text-uphill">
          {banner}
        </p>
      ) : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Posting…' : submitLabel}
        </Button>
        {onCancel ? (
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
