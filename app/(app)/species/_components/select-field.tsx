import { forwardRef, useId, type SelectHTMLAttributes } from 'react';

interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  options: ReadonlyArray<readonly [string, string]>;
  error?: string;
}

export const SelectField = forwardRef<HTMLSelectElement, SelectFieldProps>(function SelectField({ label, options, error, id, ...props }, ref) {
  const autoId = useId();
  const selectId = id ?? autoId;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={selectId} className="text-sm font-medium text-ink">{label}</label>
      <select ref={ref} id={selectId} aria-invalid={error ? true : undefined} className="rounded-md border border-paper-edge bg-white px-2 py-1.5 text-sm" {...props}>
        {options.map(([value, text]) => <option key={value} value={value}>{text}</option>)}
      </select>
      {error ? <p className="text-xs text-uphill">{error}</p> : null}
    </div>
  );
});
