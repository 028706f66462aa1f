import { forwardRef, useId, type TextareaHTMLAttributes } from 'react';
import { COMPACT_INPUT } from './input-class';

interface TextAreaFieldProps extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  label: string;
  error?: string;
  hint?: string;
  /** visually hidden label (the context names the field) */
  hideLabel?: boolean;
}

export const TextAreaField = forwardRef<HTMLTextAreaElement, TextAreaFieldProps>(function TextAreaField(
  { label, error, hint, hideLabel = false, id, className = '', rows = 3, ...props },
  ref,
) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const describedBy = error ? `${inputId}-error` : hint ? `${inputId}-hint` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className={hideLabel ? 'sr-only' : 'text-xs font-medium text-ink'}>
        {label}
      </label>
      <textarea ref={ref} id={inputId} rows={rows} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className={`${COMPACT_INPUT} ${error ? 'border-uphill' : ''}`} {...props} />
      {error ? (
        <p id={`${inputId}-error`} className="text-xs text-uphill">
          {error}
        </p>
      ) : hint ? (
        <p id={`${inputId}-hint`} className="text-xs text-ink-faint">
          {hint}
        </p>
      ) : null}
    </div>
  );
});
