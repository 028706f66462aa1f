'use client';

import { scaleLinear } from 'd3-scale';
import type { SeriesPoint } from '@/lib/species/formation-series';

const W = 420;
const H = 220;
const M = { top: 12, right: 14, bottom: 36, left: 58 };

interface Line {
  label: string;
  points: SeriesPoint[];
  dashed?: boolean;
}

function pathOf(points: { x: number; y: number }[]): string {
  return points.map((p, i) => `${i ? 'L' : 'M'}${p.x.toFixed(1)},${p.y.toFixed(1)}`).join('');
}

/** One quantity against T over the data range; a second, dashed line for the built-in values a team species replaces. */
export function SeriesPlot({ title, unit, value, lines }: { title: string; unit: string; value: (p: SeriesPoint) => number | null; lines: Line[] }) {
  const all = lines.flatMap((l) => l.points.map((p) => ({ T: p.T_K, v: value(p) }))).filter((p): p is { T: number; v: number } => p.v !== null);
  if (all.length < 2) {
    return (
      <figure className="rounded-md border border-paper-edge bg-white p-3">
        <figcaption className="text-sm font-medium">{title}</figcaption>
        <p className="mt-2 text-sm text-ink-soft">No data to plot.</p>
      </figure>
    );
  }
  const [tMin, tMax] = [Math.min(...all.map((p) => p.T)), Math.max(...all.map((p) => p.T))];
  let [vMin, vMax] = [Math.min(...all.map((p) => p.v)), Math.max(...all.map((p) => p.v))];
  if (vMax - vMin < 1e-9) [vMin, vMax] = [vMin - 1, vMax + 1]; // a constant would draw on the frame
  const x = scaleLinear().domain([tMin, tMax]).range([M.left, W - M.right]);
  const y = scaleLinear().domain([vMin, vMax]).nice().range([H - M.bottom, M.top]);
  const fmt = (n: number) => n.toLocaleString('en-GB', { maximumFractionDigits: 1 }).replace('-', '−');
  return (
    <figure className="rounded-md border border-paper-edge bg-white p-3">
      <figcaption className="text-sm font-medium">{title}</figcaption>
      <svg viewBox={`0 0 ${W} ${H}`} className="mt-1 w-full" role="img" aria-label={`${title} from ${fmt(tMin)} to ${fmt(tMax)} K, between ${fmt(vMin)} and ${fmt(vMax)} ${unit}`}>
        {y.ticks(5).map((t) => (
          <g key={`y${t}`}>
            <line x1={M.left} x2={W - M.right} y1={y(t)} y2={y(t)} className="stroke-paper-deep" />
            <text x={M.left - 6} y={y(t)} dy="0.32em" textAnchor="end" className="fill-ink-faint text-[10px]">{fmt(t)}</text>
          </g>
        ))}
        {x.ticks(6).map((t) => (
          <text key={`x${t}`} x={x(t)} y={H - M.bottom + 14} textAnchor="middle" className="fill-ink-faint text-[10px]">{fmt(t)}</text>
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 4} textAnchor="middle" className="fill-ink-soft text-[11px]">T / K</text>
        <text transform={`translate(12 ${(M.top + H - M.bottom) / 2}) rotate(-90)`} textAnchor="middle" className="fill-ink-soft text-[11px]">{unit}</text>
        {lines.map((line) => {
          const pts = line.points.map((p) => ({ T: p.T_K, v: value(p) })).filter((p): p is { T: number; v: number } => p.v !== null);
          return (
            <path key={line.label} d={pathOf(pts.map((p) => ({ x: x(p.T), y: y(p.v) })))} fill="none" strokeWidth={line.dashed ? 1.5 : 2}
              strokeDasharray={line.dashed ? '5 4' : undefined} className={line.dashed ? 'stroke-ink-faint' : 'stroke-pine-600'} />
          );
        })}
      </svg>
      {lines.length > 1 ? (
        <ul className="mt-1 flex gap-4 text-xs text-ink-soft">
          {lines.map((l) => <li key={l.label}>{l.dashed ? '- - -' : '——'} {l.label}</li>)}
        </ul>
      ) : null}
    </figure>
  );
}
