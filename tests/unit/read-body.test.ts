import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/api/errors';
import { hasNulCharacter, readJsonBody } from '@/lib/api/read-body';

const post = (text: string) => new Request('http://x.test/api', { method: 'POST', headers: { 'content-type': 'application/json' }, body: text });

describe('JSON bodies', () => {
  it('refuses NUL anywhere in a string or a key, with a 400', async () => {
    expect(hasNulCharacter({ steps: [{ notes: 'ok', equation: 'H2(g)\u0000' }] })).toBe(true);
    expect(hasNulCharacter({ ['a\u0000']: 1 })).toBe(true);
    expect(hasNulCharacter({ steps: [{ notes: 'fine \\u0000 as typed text' }] })).toBe(false);
    const error = await readJsonBody(post(JSON.stringify({ name: 'x\u0000y' }))).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).status).toBe(400);
  });

  it('walks deep nesting without overflowing the stack', () => {
    let deep: unknown = 'leaf\u0000';
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(hasNulCharacter(deep)).toBe(true);
  });
});
