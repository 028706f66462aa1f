import { forwardRef, useId, type InputHTMLAttributes } from 'react';
import { FieldNote, fieldNoteId } from './field-note';

interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  error?: string;
  hint?: string;
}

export const TextField = forwardRef<HTMLInputElement, TextFieldProps>(function TextField({ label, error, hint, id, className = '', ...props }, ref) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const describedBy = fieldNoteId(inputId, error, hint);
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="text-sm font-medium text-ink">
        {label}
      </label>
      <input
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`rounded-md border bg-white px-2.5 py-1.5 text-sm shadow-sm outline-none focus:border-pine-500 focus:ring-2 focus:ring-pine-100 ${error ? 'border-uphill' : 'border-paper-edge'}`}
        {...props}
      />
      <FieldNote inputId={inputId} error={error} hint={hint} />
    </div>
  );
});
