// A step's class as a pill: colour, glyph and word together, never colour alone.
import type { StepClass } from '@/lib/thermo/route';
import { CLASS_TEXT } from './ladder-describe';
import { CLASS_STYLES } from './ladder-palette';

const TONE: Record<StepClass, string> = {
  downhill: 'border-downhill/40 bg-downhill-bg text-downhill',
  marginal: 'border-marginal/40 bg-marginal-bg text-marginal',
  uphill: 'border-uphill/40 bg-uphill-bg text-uphill',
  error: 'border-paper-edge bg-paper-deep text-ink-soft',
};

export function ClassBadge({ cls, isSignUncertain = false }: { cls: StepClass; isSignUncertain?: boolean }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-xs font-semibold ${TONE[cls]}`}>
      <span aria-hidden="true">{CLASS_STYLES[cls].glyph}</span>
      {CLASS_TEXT[cls]}
      {isSignUncertain ? <span className="font-normal">· sign uncertain</span> : null}
    </span>
  );
}
