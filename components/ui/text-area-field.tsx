import { forwardRef, useId, type TextareaHTMLAttributes } from 'react';
import { COMPACT_INPUT } from './input-class';
import { FieldNote, fieldNoteId } from './field-note';

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
  const describedBy = fieldNoteId(inputId, error, hint);
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className={hideLabel ? 'sr-only' : 'text-xs font-medium text-ink'}>
        {label}
      </label>
      <textarea ref={ref} id={inputId} rows={rows} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className={`${COMPACT_INPUT} ${error ? 'border-uphill' : ''}`} {...props} />
      <FieldNote inputId={inputId} error={error} hint={hint} />
    </div>
  );
});
