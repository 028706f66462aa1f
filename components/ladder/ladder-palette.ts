// The chart's colours as literal hex values (they mirror tailwind.config.ts; a unit test keeps them equal),
// because an exported SVG or PNG cannot resolve Tailwind classes or CSS variables.
import type { StepClass } from '@/lib/thermo/route';

export const LADDER_COLOURS = {
  paper: '#f6f4ee',
  paperDeep: '#ebe7dc',
  paperEdge: '#d8d2c2',
  ink: '#1f2a27',
  inkSoft: '#4a5853',
  inkFaint: '#7a8580',
  brass: '#b08a2e',
  brassLight: '#f4e8cc',
  brassDeep: '#7a5e1c',
  downhill: '#2e6b5a',
  downhillBg: '#e3f0ea',
  marginal: '#a06a12',
  marginalBg: '#f8ecd3',
  uphill: '#a33b2b',
  uphillBg: '#f6e0db',
} as const;

/** Fonts every machine has, for the exported file; in the page the SVG inherits the app's face. */
export const EXPORT_FONT_STACK = "Inter, 'Helvetica Neue', Arial, 'DejaVu Sans', sans-serif";

export interface ClassStyle {
  stroke: string;
  fill: string;
  /** an SVG pattern id, so the class also shows without colour */
  pattern: string | null;
  glyph: string;
  label: string;
}

export const CLASS_STYLES: Record<StepClass, ClassStyle> = {
  downhill: { stroke: LADDER_COLOURS.downhill, fill: LADDER_COLOURS.downhill, pattern: null, glyph: '↓', label: 'downhill' },
  marginal: { stroke: LADDER_COLOURS.marginal, fill: LADDER_COLOURS.marginalBg, pattern: 'dots', glyph: '≈', label: 'marginal' },
  uphill: { stroke: LADDER_COLOURS.uphill, fill: LADDER_COLOURS.uphillBg, pattern: 'hatch', glyph: '↑', label: 'uphill' },
  error: { stroke: LADDER_COLOURS.inkFaint, fill: LADDER_COLOURS.paperDeep, pattern: null, glyph: '!', label: 'not evaluated' },
};
