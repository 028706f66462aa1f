// Our mark: three descending treads of a stepwell, read as a free-energy staircase going downhill.
export function StepwellMark({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" className={className} aria-hidden="true">
      <rect x="1" y="3" width="22" height="18" rx="4" fill="#245746" />
      <path d="M5 7h5v4h4v4h5" fill="none" stroke="#f4e8cc" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  );
}
