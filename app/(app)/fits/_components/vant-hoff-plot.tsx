import { scaleLinear } from 'd3-scale';
import type { AnalysedPoint, FitAnalysis } from '@/lib/fits/analyse-fit';

const W = 640;
const H_MAIN = 300;
const H_RES = 130;
const M = { left: 64, right: 16, top: 12, bottom: 40 };

const fmt = (x: number, d = 3) => Number(x.toPrecision(d)).toString();

// Included points are filled circles, >3σ ones filled triangles with a label, excluded ones hollow squares with their reason.
function Marker({ p, x, y }: { p: AnalysedPoint; x: number; y: number }) {
  const label = `Point ${p.index + 1}: ${fmt(p.T_K, 5)} K, ln K ${fmt(p.lnK, 4)}, residual ${fmt(p.residual, 2)}${p.outlier ? ' (over 3σ)' : ''}${p.excluded ? `, left out: ${p.reason}` : ''}`;
  if (p.excluded) {
    return (
      <rect x={x - 4} y={y - 4} width={8} height={8} fill="white" stroke="currentColor" strokeWidth={1.5} className="text-ink-soft" data-point="excluded">
        <title>{label}</title>
      </rect>
    );
  }
  if (p.outlier) {
    return (
      <g data-point="outlier">
        <path d={`M ${x} ${y - 6} L ${x + 6} ${y + 5} L ${x - 6} ${y + 5} Z`} className="fill-uphill">
          <title>{label}</title>
        </path>
        <text x={x + 8} y={y - 6} className="fill-uphill text-[10px]">
          &gt;3σ
        </text>
      </g>
    );
  }
  return (
    <circle cx={x} cy={y} r={3.5} className="fill-pine-700" data-point="included">
      <title>{label}</title>
    </circle>
  );
}

/** ln K against 1/T with the fitted line and its band, and the residuals below on the same 1/T axis. */
export function VantHoffPlot({ analysis }: { analysis: FitAnalysis }) {
  const { points, band } = analysis;
  const xs = [...points.map((p) => p.invT), ...band.map((b) => b.invT)];
  const ys = [...points.map((p) => p.lnK), ...band.flatMap((b) => [b.lower, b.upper])];
  const pad = (lo: number, hi: number) => (hi - lo || Math.abs(hi) || 1) * 0.06;
  const [x0, x1] = [Math.min(...xs), Math.max(...xs)];
  const [y0, y1] = [Math.min(...ys), Math.max(...ys)];
  const x = scaleLinear().domain([x0 - pad(x0, x1), x1 + pad(x0, x1)]).range([M.left, W - M.right]);
  const y = scaleLinear().domain([y0 - pad(y0, y1), y1 + pad(y0, y1)]).range([H_MAIN - M.bottom, M.top]).nice();
  const rMax = Math.max(...points.map((p) => Math.abs(p.residual)), 1e-12) * 1.2;
  const r = scaleLinear().domain([-rMax, rMax]).range([H_RES - M.bottom, M.top]);
  const line = band.map((b, i) => `${i ? 'L' : 'M'} ${x(b.invT)} ${y(b.lnK)}`).join(' ');
  const area = [...band.map((b) => `${x(b.invT)},${y(b.upper)}`), ...[...band].reverse().map((b) => `${x(b.invT)},${y(b.lower)}`)].join(' ');
  const xTicks = x.ticks(5);
  return (
    <figure className="flex flex-col gap-1">
      <svg viewBox={`0 0 ${W} ${H_MAIN + H_RES}`} className="w-full max-w-3xl text-ink" role="img" aria-label="van ’t Hoff plot: ln K against 1/T with the fitted line, its 95 % band and the residuals">
        <polygon points={area} className="fill-pine-100" data-band="" />
        <path d={line} fill="none" className="stroke-pine-600" strokeWidth={1.5} />
        {y.ticks(5).map((t) => (
          <g key={`y${t}`}>
            <line x1={M.left - 4} x2={M.left} y1={y(t)} y2={y(t)} stroke="currentColor" />
            <text x={M.left - 6} y={y(t) + 3} textAnchor="end" className="fill-ink-soft text-[10px]">
              {fmt(t)}
            </text>
          </g>
        ))}
        <text x={14} y={(H_MAIN - M.bottom + M.top) / 2} transform={`rotate(-90 14 ${(H_MAIN - M.bottom + M.top) / 2})`} textAnchor="middle" className="fill-ink text-[11px]">
          ln K
        </text>
        <line x1={M.left} x2={M.left} y1={M.top} y2={H_MAIN - M.bottom} stroke="currentColor" />
        {points.map((p) => (
          <Marker key={p.index} p={p} x={x(p.invT)} y={y(p.lnK)} />
        ))}
        <g transform={`translate(0 ${H_MAIN - 20})`}>
          <line x1={M.left} x2={W - M.right} y1={r(0)} y2={r(0)} className="stroke-ink-faint" strokeDasharray="3 3" />
          <line x1={M.left} x2={M.left} y1={M.top} y2={H_RES - M.bottom} stroke="currentColor" />
          <text x={14} y={(H_RES - M.bottom + M.top) / 2} transform={`rotate(-90 14 ${(H_RES - M.bottom + M.top) / 2})`} textAnchor="middle" className="fill-ink text-[11px]">
            residual
          </text>
          {points.map((p) => (
            <Marker key={p.index} p={p} x={x(p.invT)} y={r(p.residual)} />
          ))}
          {xTicks.map((t) => (
            <g key={`x${t}`}>
              <line x1={x(t)} x2={x(t)} y1={H_RES - M.bottom} y2={H_RES - M.bottom + 4} stroke="currentColor" />
              <text x={x(t)} y={H_RES - M.bottom + 15} textAnchor="middle" className="fill-ink-soft text-[10px]">
                {fmt(t * 1000, 3)}
              </text>
            </g>
          ))}
          <text x={(M.left + W - M.right) / 2} y={H_RES - 6} textAnchor="middle" className="fill-ink text-[11px]">
            1000 K / T
          </text>
        </g>
      </svg>
      <figcaption className="text-xs text-ink-soft">
        ● point in the fit · ▲ residual over 3σ (labelled) · □ left out of the fit (hover for the reason) · shaded: {Math.round(analysis.bandLevel * 100)} % band of the line
      </figcaption>
    </figure>
  );
}
