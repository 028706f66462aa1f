/** "12,15,19" → [12, 15, 19]; anything else → null, and the page says so before asking the server. */
export function parseIds(raw: string | string[] | undefined): number[] | null {
  const text = Array.isArray(raw) ? raw.join(',') : (raw ?? '');
  const parts = text
    .split(',')
    .map((p) => p.trim())
    .filter(Boolean);
  if (parts.length === 0 || !parts.every((p) => /^\d{1,9}$/.test(p))) return null;
  return parts.map(Number);
}
