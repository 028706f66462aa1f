import type { StepClass } from '@/lib/thermo/route';
import { CLASS_STYLES } from '../ladder/ladder-palette';

// The class on a canvas node: never colour alone, always the glyph and the word ("check equation" for errors).
export const CLASS_BADGE_TONES: Record<StepClass, string> = {
  downhill: 'bg-downhill-bg text-downhill border-downhill/40',
  marginal: 'bg-marginal-bg text-marginal border-marginal/40',
  uphill: 'bg-uphill-bg text-uphill border-uphill/40',
  error: 'bg-paper-deep text-ink-soft border-paper-edge',
};

export function NodeClassBadge({ cls, signUncertain = false, signUncertainText = '' }: { cls: StepClass | null; signUncertain?: boolean; signUncertainText?: string }) {
  if (!cls) return <span className="rounded border border-paper-edge px-1.5 text-[11px] text-ink-faint">not evaluated</span>;
  const style = CLASS_STYLES[cls];
  return (
    <span className="inline-flex items-center gap-1">
      <span data-class={cls} className={`inline-flex items-center gap-1 rounded border px-1.5 text-[11px] font-semibold ${CLASS_BADGE_TONES[cls]}`}>
        <span aria-hidden="true">{style.glyph}</span>
        {style.label}
      </span>
      {signUncertain && cls !== 'error' ? (
        <span className="rounded border border-dashed border-brass-700 bg-brass-100 px-1 text-[11px] text-brass-700" title={signUncertainText || 'Within the data uncertainty ΔG could have either sign'}>
          ± sign uncertain
          {/* The σ for screen readers; the badge stays short on the node. */}
          {signUncertainText.startsWith('sign uncertain') ? <span className="sr-only">{signUncertainText.slice('sign uncertain'.length)}</span> : null}
        </span>
      ) : null}
    </span>
  );
}
