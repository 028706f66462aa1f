// Where a value came from, as a glyph plus a word, never colour alone: a filled square for a published library value,
// an outlined diamond for the team's own, a dashed ring for an estimate. The full sentence is in the title and, for
// screen readers, in visually hidden text.
import { describeOrigin, ORIGIN_LABEL, type OriginFacts, type ValueOrigin } from './origin-text';

const GLYPH: Record<ValueOrigin, string> = {
  library: 'h-2 w-2 bg-ink-soft',
  team: 'h-2 w-2 rotate-45 border-[1.5px] border-brass-700 bg-brass-100',
  estimated: 'h-2.5 w-2.5 rounded-full border-[1.5px] border-dashed border-ink-soft',
};

const TONE: Record<ValueOrigin, string> = {
  library: 'border-paper-edge bg-paper text-ink-soft',
  team: 'border-brass-500/50 bg-brass-100 text-brass-700',
  estimated: 'border-dashed border-ink-faint bg-white text-ink-soft',
};

export function OriginMark({ facts, className = '' }: { facts: OriginFacts; className?: string }) {
  const sentence = describeOrigin(facts);
  return (
    <span
      className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-1 py-px text-[11px] font-medium leading-tight ${TONE[facts.origin]} ${className}`}
      title={sentence}
      data-origin={facts.origin}
    >
      <span aria-hidden="true" className={`inline-block shrink-0 ${GLYPH[facts.origin]}`} />
      {ORIGIN_LABEL[facts.origin]}
      <span className="sr-only">: {sentence}</span>
    </span>
  );
}
