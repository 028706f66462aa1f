'use client';

import { useId, useState, type ChangeEvent } from 'react';
import { FieldNote, fieldNoteId } from './field-note';

interface FileInputProps {
  label: string;
  /** file types offered by the picker, as the `accept` attribute */
  accept?: string;
  hint?: string;
  error?: string;
  disabled?: boolean;
  /** the chosen file; undefined when the picker was cancelled */
  onFile: (file: File | undefined) => void;
  className?: string;
}

/**
 * Every file picker of the app: our button look, the chosen file's name beside it. The real input lies over the
 * button (transparent), so the label, keyboard, focus and screen readers all reach the native control. Its value is
 * emptied after each choice so choosing the same file again (after fixing it) is a new choice, not a silent no-op.
 */
export function FileInput({ label, accept, hint, error, disabled = false, onFile, className = '' }: FileInputProps) {
  const inputId = useId();
  const nameId = `${inputId}-name`;
  const [fileName, setFileName] = useState<string | null>(null);

  const handleChange = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    setFileName(file?.name ?? null);
    event.target.value = '';
    onFile(file);
  };

  const note = fieldNoteId(inputId, error, hint);
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="text-sm font-medium text-ink">
        {label}
      </label>
      <div className="flex min-w-0 items-center gap-2">
        <span
          className={`relative inline-flex shrink-0 items-center rounded-md border bg-white px-3 py-1.5 text-sm font-medium focus-within:border-pine-500 focus-within:ring-2 focus-within:ring-pine-100 ${
            error ? 'border-uphill' : 'border-paper-edge'
          } ${disabled ? 'text-ink-faint' : 'text-ink hover:bg-paper-deep'}`}
        >
          <span aria-hidden="true">Choose file…</span>
          <input
            id={inputId}
            type="file"
            accept={accept}
            disabled={disabled}
            aria-invalid={error ? true : undefined}
            aria-describedby={[nameId, note].filter(Boolean).join(' ')}
            onChange={handleChange}
            className="absolute inset-0 h-full w-full cursor-pointer opacity-0 disabled:cursor-not-allowed"
          />
        </span>
        <span id={nameId} data-testid="file-input-name" className={`min-w-0 truncate text-sm ${fileName ? 'text-ink' : 'text-ink-faint'}`}>
          {fileName ?? 'No file chosen'}
        </span>
      </div>
      <FieldNote inputId={inputId} error={error} hint={hint} />
    </div>
  );
}
