// Where a `next` or callback URL may send the browser: only to a path on the app's own origin.
// Pure and dependency-free, so the sign-in page, the browser and next-auth's redirect callback share it.

export const DEFAULT_NEXT_PATH = '/routes';

// When the real origin is not at hand, any fixed one will do: all that matters is "same origin or not".
const PLACEHOLDER_ORIGIN = 'https://stepwell.invalid';
// Browsers drop tabs and newlines while parsing (`/\t/evil` becomes `//evil`), so no control character passes.
// eslint-disable-next-line no-control-regex
const CONTROL_CHARACTER = /[\u0000-\u001f\u007f]/;
const MAX_LENGTH = 2048;

function parse(input: string, base: URL): URL | null {
  try {
    return new URL(input, base);
  } catch {
    return null;
  }
}

/**
 * Resolves `raw` against `origin` with the URL parser (the browser's rules: backslashes are slashes, `//` starts a
 * host) and answers its path, query and fragment when it stays on that origin; `fallback` otherwise.
 */
export function safeNextPath(raw: unknown, origin: string = PLACEHOLDER_ORIGIN, fallback: string = DEFAULT_NEXT_PATH): string {
  if (typeof raw !== 'string' || raw === '' || raw.length > MAX_LENGTH || CONTROL_CHARACTER.test(raw) || raw.trim() !== raw) return fallback;
  const base = parse(origin, new URL(PLACEHOLDER_ORIGIN)) ?? new URL(PLACEHOLDER_ORIGIN);
  const resolved = parse(raw, base);
  if (!resolved || resolved.origin !== base.origin || resolved.username || resolved.password) return fallback;
  const path = `${resolved.pathname}${resolved.search}${resolved.hash}`;
  // The path alone must lead to the same place: `/.//evil` normalises to `//evil`, which names another host.
  const again = parse(path, base);
  return again && again.href === resolved.href ? path : fallback;
}
