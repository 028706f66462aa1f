// `@handle` mentions, where a handle is the local part of a member's e-mail address. Pure: shared by
// the comment service (which resolves them) and the renderer (which marks them).

const HANDLE_CHARS = 'A-Za-z0-9._+-';
// An "@" that starts a word (not the middle of an address like a@b.test), then the handle.
const MENTION = new RegExp(`(^|[^${HANDLE_CHARS}@])@([${HANDLE_CHARS}]+)`, 'g');
const TRAILING_PUNCTUATION = /[._+-]+$/;

/** The handle of an e-mail address, lower-cased: "Hanne.Vasquez-Lind@x.test" → "hanne.vasquez-lind". */
export function handleOf(email: string): string {
  const at = email.lastIndexOf('@');
  return (at > 0 ? email.slice(0, at) : email).toLowerCase();
}

/**
 * Handles written as `@handle` in plain text, lower-cased, in order of first appearance. A handle
 * ending a sentence ("@ottilie.") is offered both with and without its trailing punctuation.
 */
export function handlesInText(text: string): string[] {
  const found: string[] = [];
  for (const match of text.matchAll(MENTION)) {
    const raw = match[2]!.toLowerCase();
    for (const h of [raw, raw.replace(TRAILING_PUNCTUATION, '')]) if (h && !found.includes(h)) found.push(h);
  }
  return found;
}

/** Splits text into plain runs and runs that are a known `@handle` (case-insensitive), for rendering. */
export function splitMentions(text: string, handles: ReadonlyArray<string>): Array<{ text: string; handle?: string }> {
  const known = new Set(handles.map((h) => h.toLowerCase()));
  if (known.size === 0) return [{ text }];
  const parts: Array<{ text: string; handle?: string }> = [];
  let last = 0;
  for (const match of text.matchAll(MENTION)) {
    let handle = match[2]!;
    if (!known.has(handle.toLowerCase())) handle = handle.replace(TRAILING_PUNCTUATION, '');
    if (!handle || !known.has(handle.toLowerCase())) continue;
    const start = match.index! + match[1]!.length;
    if (start > last) parts.push({ text: text.slice(last, start) });
    parts.push({ text: `@${handle}`, handle: handle.toLowerCase() });
    last = start + 1 + handle.length;
  }
  if (last < text.length) parts.push({ text: text.slice(last) });
  return parts;
}
