import { AppError } from './errors';

export const DEFAULT_MAX_BODY_BYTES = 1024 * 1024;

// Reads at most `limit` bytes so an oversized body is refused without buffering all of it.
export async function readJsonBody(req: Request, limit = DEFAULT_MAX_BODY_BYTES): Promise<unknown> {
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > limit) throw tooLarge(limit);
  const type = req.headers.get('content-type') ?? '';
  if (type && !type.toLowerCase().includes('application/json')) {
    throw new AppError('UNSUPPORTED_MEDIA_TYPE', 'Send the body as application/json.');
  }
  if (!req.body) return undefined;
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel();
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  const text = Buffer.concat(chunks).toString('utf8');
  if (text.trim() === '') return undefined;
  let parsed: unknown;
  try {
    parsed = JSON.parse(text) as unknown;
  } catch {
    throw new AppError('BAD_REQUEST', 'The request body is not valid JSON.');
  }
  // No text we keep may hold NUL: SQLite's bulk inserts write values into the statement, where NUL ends it.
  if (hasNulCharacter(parsed)) throw new AppError('BAD_REQUEST', 'Text in the request may not contain the NUL character (\\u0000).');
  return parsed;
}

/** Whether any string (key or value) in parsed JSON holds U+0000; iterative, so deep nesting cannot overflow the stack. */
export function hasNulCharacter(value: unknown): boolean {
  const stack: unknown[] = [value];
  while (stack.length) {
    const v = stack.pop();
    if (typeof v === 'string') {
      if (v.includes('\u0000')) return true;
    } else if (Array.isArray(v)) {
      for (const item of v) stack.push(item);
    } else if (v !== null && typeof v === 'object') {
      for (const [k, child] of Object.entries(v)) {
        if (k.includes('\u0000')) return true;
        stack.push(child);
      }
    }
  }
  return false;
}

function tooLarge(limit: number): AppError {
  return new AppError('PAYLOAD_TOO_LARGE', `The request body is larger than ${Math.round(limit / 1024)} KB.`);
}
