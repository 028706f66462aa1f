// The ladder's static parts: fill patterns, legend, y-axis with ticks and unit, zero line, start point and
// step labels. Literal colours and attributes throughout, so an exported file looks the same.
import { formatSigned } from './energy-format';
import { fitLabel, tickDecimals, type LadderLayout, type LegendItemLayout } from './ladder-geometry';
import { CLASS_STYLES, LADDER_COLOURS as C } from './ladder-palette';

export function LadderPatterns({ prefix }: { prefix: string }) {
  return (
    <defs>
      <pattern id={`${prefix}-hatch`} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <line x1={0} y1={0} x2={0} y2={6} stroke={C.uphill} strokeWidth={2.2} />
      </pattern>
      <pattern id={`${prefix}-dots`} width={5} height={5} patternUnits="userSpaceOnUse">
        <circle cx={2.5} cy={2.5} r={1.1} fill={C.marginal} />
      </pattern>
    </defs>
  );
}

function LegendSwatch({ item, prefix }: { item: LegendItemLayout; prefix: string }) {
  const y = item.y;
  if (item.key === 'conditions') return <line x1={item.x} x2={item.x + 18} y1={y} y2={y} stroke={C.ink} strokeWidth={2} />;
  if (item.key === 'standard') return <line x1={item.x} x2={item.x + 18} y1={y} y2={y} stroke={C.inkSoft} strokeWidth={1.5} strokeDasharray="5 4" />;
  if (item.key === 'estimated') {
    return <rect x={item.x + 3} y={y - 7} width={12} height={14} fill="none" stroke={C.ink} strokeWidth={1.25} strokeDasharray="1 2.5" strokeLinecap="round" />;
  }
  if (item.key === 'error') {
    return (
      <g>
        <circle cx={item.x + 9} cy={y} r={6} fill={C.paperDeep} stroke={C.inkFaint} strokeWidth={1.25} />
        <text x={item.x + 9} y={y} textAnchor="middle" dominantBaseline="central" fontSize={9} fontWeight={700} fill={C.inkSoft}>
          !
        </text>
      </g>
    );
  }
  const style = CLASS_STYLES[item.key];
  return (
    <g>
      <rect x={item.x + 4} y={y - 6} width={10} height={12} fill={style.fill} stroke={style.stroke} strokeWidth={1.25} />
      {style.pattern ? <rect x={item.x + 4} y={y - 6} width={10} height={12} fill={`url(#${prefix}-${style.pattern})`} /> : null}
    </g>
  );
}

export function LadderLegend({ items, prefix }: { items: readonly LegendItemLayout[]; prefix: string }) {
  return (
    <g aria-hidden="true">
      {items.map((item) => (
        <g key={item.key}>
          <LegendSwatch item={item} prefix={prefix} />
          <text x={item.x + 24} y={item.y} dominantBaseline="middle" fontSize={11} fill={C.inkSoft}>
            {item.label}
          </text>
        </g>
      ))}
    </g>
  );
}

export function LadderAxes({ layout, title }: { layout: LadderLayout; title: string }) {
  const { plot, ticks } = layout;
  const decimals = tickDecimals(ticks.map((t) => t.value));
  const midY = (plot.top + plot.bottom) / 2;
  return (
    <g aria-hidden="true">
      {ticks.map((t) => (
        <g key={t.value}>
          <line x1={plot.left} x2={plot.right} y1={t.y} y2={t.y} stroke={C.paperEdge} strokeWidth={1} />
          <text x={plot.left - 6} y={t.y} textAnchor="end" dominantBaseline="middle" fontSize={10} fill={C.inkSoft}>
            {t.value === 0 ? '0' : formatSigned(t.value, decimals)}
          </text>
        </g>
      ))}
      <line x1={plot.left} x2={plot.left} y1={plot.top} y2={plot.bottom} stroke={C.inkFaint} strokeWidth={1} />
      <text x={14} y={midY} transform={`rotate(-90 14 ${midY})`} textAnchor="middle" dominantBaseline="middle" fontSize={11} fill={C.inkSoft}>
        {title}
      </text>
    </g>
  );
}

export function LadderZeroAndStart({ layout }: { layout: LadderLayout }) {
  const { plot, zeroY, start } = layout;
  return (
    <g aria-hidden="true">
      <line x1={plot.left} x2={plot.right} y1={zeroY} y2={zeroY} stroke={C.inkSoft} strokeWidth={1.25} />
      <line x1={start.x1} x2={start.x2} y1={start.y} y2={start.y} stroke={C.ink} strokeWidth={2} />
      <circle cx={start.x1} cy={start.y} r={3.5} fill={C.ink} />
    </g>
  );
}

export function LadderStepLabels({ layout, labelOf, selectedId }: { layout: LadderLayout; labelOf: (id: string) => string; selectedId: string | null }) {
  const y = layout.plot.bottom + 16;
  return (
    <g aria-hidden="true">
      <text x={layout.start.labelX} y={y} textAnchor="middle" fontSize={10} fill={C.inkFaint}>
        start
      </text>
      {layout.labelXs.map(({ id, x }) => {
        const full = labelOf(id);
        const isSelected = id === selectedId;
        return (
          <text key={id} x={x} y={y} textAnchor="middle" fontSize={11} fontWeight={isSelected ? 700 : 400} fill={isSelected ? C.ink : C.inkSoft}>
            <title>{full}</title>
            {fitLabel(full, layout.bandWidth)}
          </text>
        );
      })}
      {layout.labelXs.map(({ id, x }) =>
        id === selectedId ? <path key={`${id}-mark`} data-export-skip d={`M${x - 5},${y + 12}h10l-5,-6z`} fill={C.brassDeep} /> : null,
      )}
    </g>
  );
}

/** Notes under the step labels (estimated values, the total's σ): part of the picture, so exports carry them. */
export function LadderNotes({ layout, notes }: { layout: LadderLayout; notes: readonly string[] }) {
  const room = layout.plot.right - layout.plot.left;
  return (
    <g data-testid="ladder-notes">
      {notes.map((note, i) => {
        const y = layout.noteYs[i];
        if (y === undefined) return null;
        // SVG text does not wrap: a note too long for the chart is shortened here and said whole in the <desc>.
        return (
          <text key={note} x={layout.plot.left} y={y} fontSize={11} fill={C.ink}>
            <title>{note}</title>
            {fitLabel(note, room + 6, 6)}
          </text>
        );
      })}
    </g>
  );
}
