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
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new AppError('BAD_REQUEST', 'The request body is not valid JSON.');
  }
}

function tooLarge(limit: number): AppError {
  return new AppError('PAYLOAD_TOO_LARGE', `The request body is larger than ${Math.round(limit / 1024)} KB.`);
}
