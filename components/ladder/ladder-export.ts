// Export of the ladder as a standalone SVG file or a 2× PNG. The chart draws with literal colours and
// attributes, so a clone of its SVG only needs the page-only parts removed and a font stack every viewer has.
import { writeCsv } from '@/lib/csv/write-csv';
import { CAUTION_SHORT } from '@/lib/safety/caution-text';
import { EXPORT_FONT_STACK, LADDER_COLOURS } from './ladder-palette';

const SVG_NS = 'http://www.w3.org/2000/svg';

/** "Route 7 / ladder" → "route-7-ladder.svg"; never empty. */
export function exportFileName(base: string, ext: 'svg' | 'png' | 'csv'): string {
  const slug = base
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, '-')
    .slice(0, 80);
  return `${slug || 'free-energy-ladder'}.${ext}`;
}

export function serializeLadderSvg(svg: SVGSVGElement, width: number, height: number): string {
  const clone = svg.cloneNode(true) as SVGSVGElement;
  // Focus rings, hit areas and the selection highlight belong to the page, not to the picture.
  clone.querySelectorAll('[data-export-skip]').forEach((el) => el.remove());
  clone.querySelectorAll('[tabindex]').forEach((el) => el.removeAttribute('tabindex'));
  clone.removeAttribute('class');
  clone.removeAttribute('style');
  clone.setAttribute('xmlns', SVG_NS);
  clone.setAttribute('width', String(width));
  clone.setAttribute('height', String(height));
  clone.setAttribute('viewBox', `0 0 ${width} ${height}`);
  clone.setAttribute('font-family', EXPORT_FONT_STACK);
  const background = document.createElementNS(SVG_NS, 'rect');
  background.setAttribute('width', '100%');
  background.setAttribute('height', '100%');
  background.setAttribute('fill', LADDER_COLOURS.paper);
  clone.insertBefore(background, clone.firstChild);
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(clone)}`;
}

export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  document.body.appendChild(a);
  a.click();
  a.remove();
  // Revoked on a later tick: some browsers start the download asynchronously.
  window.setTimeout(() => URL.revokeObjectURL(url), 1000);
}

export function csvBlob(csvText: string): Blob {
  // A byte-order mark, so spreadsheets read σ, Δ and ° as UTF-8; a last row with the caution, since the file travels without the page.
  return new Blob(['\uFEFF', csvText, '\r\n', writeCsv([['Caution', CAUTION_SHORT]])], { type: 'text/csv;charset=utf-8' });
}

export function svgBlob(svgText: string): Blob {
  return new Blob([svgText], { type: 'image/svg+xml;charset=utf-8' });
}

/** Draws the SVG (as a data URL, so the canvas stays untainted) on an offscreen canvas at `scale`. */
export async function svgToPngBlob(svgText: string, width: number, height: number, scale = 2): Promise<Blob> {
  const image = new Image();
  image.decoding = 'async';
  const loaded = new Promise<void>((resolve, reject) => {
    image.onload = () => resolve();
    image.onerror = () => reject(new Error('The ladder could not be drawn as an image'));
  });
  image.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svgText)}`;
  await loaded;
  const canvas = document.createElement('canvas');
  canvas.width = Math.round(width * scale);
  canvas.height = Math.round(height * scale);
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('This browser cannot draw on a canvas');
  ctx.scale(scale, scale);
  ctx.drawImage(image, 0, 0, width, height);
  return new Promise<Blob>((resolve, reject) => {
    canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('The PNG could not be encoded'))), 'image/png');
  });
}
