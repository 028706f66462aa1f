// The hover/focus card for one step: its label, equation, ΔG, ΔG°, extent and class. HTML over the SVG,
// so it wraps text and stays out of the exported picture.
import type { RouteStepResult } from '@/lib/thermo/route';
import type { EnergyUnit } from './energy-format';
import { stepFacts } from './ladder-describe';
import type { RiserLayout } from './ladder-geometry';
import { ChemText } from '@/components/chemistry/chem-text';

const TIP_WIDTH = 260;

interface LadderTooltipProps {
  id: string;
  riser: RiserLayout;
  step: RouteStepResult | undefined;
  label: string;
  unit: EnergyUnit;
  containerWidth: number;
}

export function LadderTooltip({ id, riser, step, label, unit, containerWidth }: LadderTooltipProps) {
  const anchorX = riser.bandX + riser.bandWidth / 2;
  const anchorY = riser.step.gap ? riser.levelY - 12 : Math.min(riser.y, riser.treadY) - 10;
  // Kept inside the chart horizontally; it opens above the step, or below when the step is near the top.
  const left = Math.max(4, Math.min(containerWidth - TIP_WIDTH - 4, anchorX - TIP_WIDTH / 2));
  const opensBelow = anchorY < 120;
  const top = opensBelow ? (riser.step.gap ? riser.levelY + 16 : Math.max(riser.y + riser.h, riser.treadY) + 10) : anchorY;
  return (
    <div
      id={id}
      role="tooltip"
      className="pointer-events-none absolute z-10 rounded-md border border-paper-edge bg-white px-3 py-2 text-xs text-ink shadow-md"
      style={{ left, top, width: TIP_WIDTH, transform: opensBelow ? undefined : 'translateY(-100%)' }}
    >
      <p className="mb-1 font-semibold">
        Step {riser.step.slot}: {label}
      </p>
      <dl className="grid grid-cols-[auto_1fr] gap-x-2 gap-y-0.5">
        {stepFacts(step, unit).map((f) => (
          <div key={f.term} className="contents">
            <dt className="text-ink-faint">{f.term}</dt>
            <dd className={f.term === 'Equation' ? 'break-words text-[11px]' : 'tabular-nums'}>{f.term === 'Equation' ? <ChemText text={f.value} /> : f.value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
