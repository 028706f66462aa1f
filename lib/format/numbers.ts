// How numbers read wherever people read them: the true minus sign (U+2212), sensible precision, powers of ten
// as "× 10⁶" and multiples as "1.7 million-fold", never "e+6" or "10^6.24". Pure, shared by server and client.
// Not for what people type into or for CSV/JSON: those keep plain ASCII numbers.

export const MINUS = '\u2212';

const SUPERSCRIPT: Record<string, string> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻', [MINUS]: '⁻', '+': '⁺', '.': '·',
};

/** "−6" → "⁻⁶", for exponents written in running text. */
export function superscript(text: string): string {
  return [...text].map((c) => SUPERSCRIPT[c] ?? c).join('');
}

/** A hyphen-minus that starts a number (at the start, after a space, bracket, "=", "→" or "~") becomes the true minus. */
export function withTrueMinus(text: string): string {
  return text.replace(/(^|[\s([{=→~≈<>≤≥/])-(?=\.?\d)/g, `$1${MINUS}`);
}

const isMissing = (x: number | null | undefined): x is null | undefined => x === null || x === undefined || !Number.isFinite(x);

/** Fixed decimals with the true minus and no "−0.0" for a value that rounds to zero; "—" for no value. */
export function formatFixed(x: number | null | undefined, decimals: number): string {
  if (isMissing(x)) return '—';
  const text = Math.abs(x).toFixed(decimals);
  if (Number(text) === 0) return text;
  return x < 0 ? `${MINUS}${text}` : text;
}

/** Fixed decimals with an explicit sign ("+12.3", "−4.1"), for changes; zero stays unsigned. */
export function formatSigned(value: number, decimals: number, opts: { plus?: boolean } = {}): string {
  const text = formatFixed(value, decimals);
  if (text === '—' || text.startsWith(MINUS) || Number(text) === 0) return text;
  return opts.plus === false ? text : `+${text}`;
}

/** Thousands grouped with a thin space would confuse copying; a comma as in English prose: "12,400". */
function grouped(text: string): string {
  const [whole, frac] = text.split('.');
  const digits = whole!.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return frac === undefined ? digits : `${digits}.${frac}`;
}

/** "1.8 × 10⁶": `digits` significant figures, the mantissa's trailing zeros kept off. */
export function formatScientific(x: number, digits = 2): string {
  if (x === 0) return '0';
  const [mantissa, exponent] = Math.abs(x).toExponential(digits - 1).split('e');
  const m = String(Number(mantissa));
  const e = Number(exponent);
  const body = m === '1' ? `10${superscript(String(e))}` : `${m} × 10${superscript(String(e))}`;
  return x < 0 ? `${MINUS}${body}` : body;
}

/**
 * A plain number to `digits` significant figures ("0.5", "1.23", "12,400"); below 0.001 or from a million up it
 * is written "1.5 × 10⁻⁷". Never e-notation, never a hyphen for minus.
 */
export function formatSignificant(x: number | null | undefined, digits = 3): string {
  if (isMissing(x)) return '—';
  if (x === 0) return '0';
  const abs = Math.abs(x);
  if (abs < 1e-3 || abs >= 1e6) return formatScientific(x, digits);
  const text = String(Number(abs.toPrecision(digits)));
  return `${x < 0 ? MINUS : ''}${grouped(text)}`;
}

const LARGE_WORDS: [number, string][] = [
  [1e12, 'trillion'],
  [1e9, 'billion'],
  [1e6, 'million'],
];

/**
 * A multiple in words: "3.2-fold", "240-fold", "12,000-fold", "1.7 million-fold", "4.1 billion-fold", and from
 * 10¹⁵ on "3.2 × 10¹⁸-fold". Two significant figures: a screen's multiples are estimates, not counts.
 */
export function formatFold(factor: number | null | undefined): string {
  if (isMissing(factor) || factor <= 0) return '—';
  if (factor >= 1e15) return `${formatScientific(factor, 2)}-fold`;
  for (const [size, word] of LARGE_WORDS) {
    if (factor >= size * 0.9995) return `${String(Number((factor / size).toPrecision(2)))} ${word}-fold`;
  }
  if (factor < 1e-3) return `${formatScientific(factor, 2)}-fold`;
  return `${grouped(String(Number(factor.toPrecision(2))))}-fold`;
}

/** An equilibrium constant or reaction quotient: "0.45", "120", "3.2 × 10⁻⁵", "7.9 × 10²⁴". */
export function formatConstant(K: number | null | undefined): string {
  if (isMissing(K)) return '—';
  const abs = Math.abs(K);
  if (abs !== 0 && (abs < 1e-2 || abs >= 1e4)) return formatScientific(K, 2);
  return formatSignificant(K, 2);
}

/** kJ (or kJ/mol) to 0.1: "−235.1". */
export function formatKJ(kJ: number | null | undefined): string {
  return formatFixed(kJ, 1);
}

// 298.15 K is the defined reference temperature; any other is shown to the kelvin.
const REFERENCE_K = 298.15;

/** Kelvin to 1 K ("650"), except the reference temperature itself ("298.15"). */
export function formatKelvin(K: number | null | undefined): string {
  if (isMissing(K)) return '—';
  if (Math.abs(K - REFERENCE_K) < 0.005) return '298.15';
  return formatFixed(K, 0);
}

/** "1 step", "3 steps". */
export function countOf(n: number, word: string, plural = `${word}s`): string {
  return `${grouped(String(n))} ${n === 1 ? word : plural}`;
}

/** Text someone typed, for reading back: numbers in e-notation become powers of ten, a leading hyphen the true minus. */
export function readableTyped(text: string): string {
  return withTrueMinus(text.replace(/(^|[\s(=])([-+]?(?:\d+\.?\d*|\.\d+)[eE][-+]?\d+)(?![\w.])/g, (_, lead: string, n: string) => `${lead}${formatSignificant(Number(n), 3)}`));
}
