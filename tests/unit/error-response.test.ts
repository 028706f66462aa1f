// The one place an exception becomes an HTTP answer: a unique-index clash from two simultaneous creates is a 409, never a 500.
import { DatabaseError, UniqueConstraintError } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { toErrorResponse } from '@/lib/api/error-response';
import { AppError } from '@/lib/api/errors';

describe('toErrorResponse', () => {
  it('answers a unique-index clash with 409 CONFLICT in the standard shape, without the SQL', async () => {
    const clash = new UniqueConstraintError({ message: 'Validation error: INSERT INTO team_species …', errors: [], fields: { key: 'C21H44(g)' } });
    const res = toErrorResponse(clash);
    expect(res.status).toBe(409);
    const body = (await res.json()) as { error: { code: string; message: string } };
    expect(body.error.code).toBe('CONFLICT');
    expect(body.error.message).toMatch(/same moment/);
    expect(JSON.stringify(body)).not.toMatch(/INSERT|team_species/);
  });

  it('answers a PostgreSQL deadlock (40P01) or serialization failure (40001) with 409, other database errors with 500', async () => {
    const failure = (code: string) => new DatabaseError(Object.assign(new Error(`database says ${code}`), { code, sql: 'UPDATE routes …' }) as never);
    for (const code of ['40P01', '40001']) {
      const res = toErrorResponse(failure(code));
      expect(res.status, code).toBe(409);
      expect(((await res.json()) as { error: { code: string } }).error.code, code).toBe('CONFLICT');
    }
    const quiet = console.error;
    console.error = () => {};
    try {
      expect(toErrorResponse(failure('22001')).status).toBe(500);
    } finally {
      console.error = quiet;
    }
  });

  it('keeps an AppError’s own status and an unknown error’s 500', async () => {
    expect(toErrorResponse(new AppError('NOT_FOUND', 'No such route.')).status).toBe(404);
    const quiet = console.error;
    console.error = () => {};
    try {
      const res = toErrorResponse(new Error('boom'));
      expect(res.status).toBe(500);
      expect(JSON.stringify(await res.json())).not.toMatch(/boom/);
    } finally {
      console.error = quiet;
    }
  });
});
