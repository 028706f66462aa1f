import { ROUTE_STATUS_LABELS, type RouteStatus } from '@/lib/schemas/workflow';

// Each review status has a glyph and a word as well as a tint, so none is told by colour alone.
const LOOK: Record<RouteStatus, { glyph: string; className: string }> = {
  draft: { glyph: '✎', className: 'border-paper-edge bg-paper-deep text-ink-soft' },
  in_review: { glyph: '◔', className: 'border-pine-100 bg-pine-50 text-pine-700' },
  changes_requested: { glyph: '↺', className: 'border-marginal/40 bg-marginal-bg text-marginal' },
  approved: { glyph: '✓', className: 'border-downhill/30 bg-downhill-bg text-downhill' },
  shelved: { glyph: '▪', className: 'border-paper-edge bg-white text-ink-faint' },
};

export function isKnownStatus(status: string): status is RouteStatus {
  return status in LOOK;
}

export function StatusBadge({ status }: { status: string }) {
  const look = isKnownStatus(status) ? LOOK[status] : LOOK.draft;
  const label = isKnownStatus(status) ? ROUTE_STATUS_LABELS[status] : status;
  return (
    <span data-testid="status-badge" className={`inline-flex items-center gap-1 rounded border px-1.5 py-0.5 text-xs font-medium ${look.className}`}>
      <span aria-hidden="true">{look.glyph}</span>
      {label}
    </span>
  );
}
