// One way to write a moment across the app: "2 Dec 2026, 09:14", with the exact time for machines.
const DATE_TIME = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

export function formatWhen(iso: string): string {
  return DATE_TIME.format(new Date(iso));
}

export function When({ iso, className = 'text-xs text-ink-faint' }: { iso: string; className?: string }) {
  return (
    <time dateTime={iso} className={className}>
      {formatWhen(iso)}
    </time>
  );
}
