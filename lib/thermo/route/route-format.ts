// Number formatting for remedy and note sentences, and rounding that never undoes a remedy.

/** 4 significant figures by default, no trailing zeros. */
export function num(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return String(x);
  return Number(x.toPrecision(digits)).toString();
}

/** x rounded to 3 significant figures, never below x (or never above, for 'down'). */
export function round3(x: number, way: 'up' | 'down'): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  let r = Number(x.toPrecision(3));
  const ulp = 10 ** (Math.floor(Math.log10(Math.abs(r))) - 2);
  if (way === 'up' && r < x) r = Number((r + ulp).toPrecision(3));
  if (way === 'down' && r > x) r = Number((r - ulp).toPrecision(3));
  return r;
}
