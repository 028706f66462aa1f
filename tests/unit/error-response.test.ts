// The one place an exception becomes an HTTP answer: a unique-index clash from two simultaneous creates is a 409, never a 500.
import { DatabaseError, UniqueConstraintError } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { toErrorResponse } from '@/lib/api/error-response';
import { AppError } from '@/lib/api/errors';

describe('toErrorResponse', () => {
  it('answers a unique-index clash with 409 CONFLICT in the standard shape, without the SQL', async () => {
    // As each driver reports it: PostgreSQL's SQLSTATE 23505, SQLite's message.
    const parents = [
      Object.assign(new Error('duplicate key value violates unique constraint "team_species_team_key"'), { code: '23505', sql: 'INSERT INTO team_species …' }),
      Object.assign(new Error('SQLITE_CONSTRAINT: UNIQUE constraint failed: team_species.team_id, team_species.key'), { code: 'SQLITE_CONSTRAINT', sql: 'INSERT INTO team_species …' }),
    ];
    for (const parent of parents) {
      const res = toErrorResponse(new UniqueConstraintError({ parent, errors: [], fields: { key: 'C21H44(g)' } } as never));
      expect(res.status, parent.message).toBe(409);
      const body = (await res.json()) as { error: { code: string; message: string } };
      expect(body.error.code).toBe('CONFLICT');
      expect(body.error.message).toMatch(/same moment/);
      expect(JSON.stringify(body)).not.toMatch(/INSERT|team_species/);
    }
  });

  it('leaves other constraint failures SQLite files under the same class (a trigger abort, a CHECK) as 500', () => {
    const parent = Object.assign(new Error('SQLITE_CONSTRAINT: simulated failure'), { code: 'SQLITE_CONSTRAINT', sql: 'UPDATE step_flags …' });
    const quiet = console.error;
    console.error = () => {};
    try {
      expect(toErrorResponse(new UniqueConstraintError({ parent, errors: [] } as never)).status).toBe(500);
    } finally {
      console.error = quiet;
    }
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
