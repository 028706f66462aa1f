// The password rule shared by the sign-up, invitation and reset forms and handlers (lib/schemas/password.ts).
import bcrypt from 'bcryptjs';
import { describe, expect, it } from 'vitest';
import { zodFields } from '@/lib/api/error-response';
import { AcceptInvitationInput, SignUpInput } from '@/lib/schemas/auth';
import { NewPassword, PASSWORD_MAX_BYTES, passwordContainsEmail, utf8Length } from '@/lib/schemas/password';
import { ResetPasswordInput } from '@/lib/schemas/password-reset';

const problem = (password: string) => {
  const parsed = NewPassword.safeParse(password);
  return parsed.success ? null : parsed.error.issues[0]!.message;
};

describe('why 72 bytes', () => {
  // bcrypt's documented input limit (Provos and Mazières, 1999): bytes past the 72nd never reach the hash.
  it('bcrypt ignores everything after the 72nd byte', async () => {
    const first72 = 'k'.repeat(PASSWORD_MAX_BYTES);
    const hash = await bcrypt.hash(`${first72}-one-ending`, 4);
    expect(await bcrypt.compare(`${first72}-another-ending`, hash)).toBe(true);
    expect(await bcrypt.compare(`${'k'.repeat(71)}j`, hash)).toBe(false);
  });
});

describe('NewPassword', () => {
  it('counts UTF-8 bytes, not characters', () => {
    expect(utf8Length('é')).toBe(2);
    expect(utf8Length('€')).toBe(3);
    expect(utf8Length('🧪')).toBe(4);
    expect(problem('abcdefgh'.repeat(9))).toBeNull();
    expect(problem(`${'abcdefgh'.repeat(9)}x`)).toMatch(/at most 72 bytes/);
    // 37 characters, 74 bytes: refused although far shorter than 72 characters.
    expect(problem('é'.repeat(36) + 'x')).toMatch(/at most 72 bytes/);
    expect(problem('é'.repeat(35) + 'xy')).toBeNull();
    expect(problem('🧪🔬'.repeat(9))).toBeNull();
    expect(problem(`${'🧪🔬'.repeat(9)}a`)).toMatch(/at most 72 bytes/);
  });

  it('keeps the short-password message the forms already show', () => {
    expect(problem('short')).toBe('Use at least 10 characters.');
  });

  it.each(['password123', 'Password2026!', 'qwertyuiop', 'QWERTYUIOP12', '1234567890', '1q2w3e4r5t', 'iloveyou!!!', 'Summer2026!', 'stepwell-demo-2026'])(
    'refuses the common password %j',
    (password) => {
      expect(problem(password)).toMatch(/most common passwords/);
    },
  );

  it('refuses one character repeated', () => {
    expect(problem('aaaaaaaaaaaa')).toMatch(/more than one kind/);
  });

  it.each(['correct-horse-9', 'a-strong-password-1', 'Tortoise, kettle, 1893', 'Öl-Kännchen-19'])('accepts %j', (password) => {
    expect(problem(password)).toBeNull();
  });
});

describe('the e-mail check', () => {
  it('finds the address or its name part, in any case', () => {
    expect(passwordContainsEmail('Rosalind@Example.test', 'rosalind@example.test')).toBe(true);
    expect(passwordContainsEmail('my-ROSALIND-2026', 'rosalind@example.test')).toBe(true);
    expect(passwordContainsEmail('a-good-password-1', 'rosalind@example.test')).toBe(false);
    // A name part of three letters or fewer turns up by chance too often to refuse it.
    expect(passwordContainsEmail('the-bob-and-alice-tale', 'bob@example.test')).toBe(false);
    expect(passwordContainsEmail('bob@example.test-123', 'bob@example.test')).toBe(true);
  });

  const signUp = { name: 'Rosalind Achterberg', email: 'Rosalind@Example.test', teamName: 'Scale-up group' };

  it('is a field error on password in the sign-up schema', () => {
    const parsed = SignUpInput.safeParse({ ...signUp, password: 'rosalind-2026-x' });
    expect(parsed.success).toBe(false);
    expect(zodFields(parsed.error!)).toMatchObject({ password: expect.stringMatching(/e-mail address/) });
    expect(SignUpInput.safeParse({ ...signUp, password: 'correct-horse-9' }).success).toBe(true);
  });

  it('applies the byte and common-password rules to invitation and reset bodies too', () => {
    expect(zodFields(AcceptInvitationInput.safeParse({ name: 'N', password: 'ü'.repeat(40) }).error!)).toMatchObject({ password: expect.stringMatching(/72 bytes/) });
    expect(zodFields(ResetPasswordInput.safeParse({ password: 'password1234' }).error!)).toMatchObject({ password: expect.stringMatching(/common/) });
  });
});
