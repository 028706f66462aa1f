import { describe, expect, it } from 'vitest';
import { filePlace } from '@/lib/services/team-transfer/file-place';

describe('filePlace', () => {
  it('puts a team file path in words, rows counted from 1', () => {
    expect(filePlace('tables.routes[1].version')).toBe('table routes, row 2, column version');
    expect(filePlace('tables.steps[0]')).toBe('table steps, row 1');
    expect(filePlace('tables.users')).toBe('table users');
  });
});
