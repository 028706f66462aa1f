// Under a form field: its error when there is one, else its hint. The ids match aria-describedby.
export function fieldNoteId(inputId: string, error?: string, hint?: string): string | undefined {
  return error ? `${inputId}-error` : hint ? `${inputId}-hint` : undefined;
}

export function FieldNote({ inputId, error, hint }: { inputId: string; error?: string; hint?: string }) {
  if (error) {
    return (
      <p id={`${inputId}-error`} className="text-xs text-uphill">
        {error}
      </p>
    );
  }
  if (hint) {
    return (
      <p id={`${inputId}-hint`} className="text-xs text-ink-faint">
        {hint}
      </p>
    );
  }
  return null;
}
