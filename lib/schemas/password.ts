import { z } from 'zod';
import { COMMON_PASSWORDS } from './common-passwords';

// The rule for every password a person chooses (sign-up, invitation, reset), shared by forms and handlers.
export const PASSWORD_MIN = 10;
/** bcrypt reads only the first 72 bytes of its input: a longer password would be cut short without a word. */
export const PASSWORD_MAX_BYTES = 72;
// An e-mail's name part shorter than this is too likely to occur by chance to refuse passwords containing it.
const MIN_LOCAL_PART = 4;

export const PASSWORD_MESSAGES = {
  tooShort: `Use at least ${PASSWORD_MIN} characters.`,
  tooLong: `Use at most ${PASSWORD_MAX_BYTES} bytes: ${PASSWORD_MAX_BYTES} plain letters, digits or symbols; letters with accents and other scripts take 2 to 4 bytes each.`,
  common: 'That is one of the most common passwords. Choose one that is harder to guess.',
  repeated: 'Use more than one kind of character.',
  email: 'Choose a password that does not contain your e-mail address or its name part.',
} as const;

export function utf8Length(text: string): number {
  return new TextEncoder().encode(text).length;
}

/** True for a listed common password, the same with digits or symbols added at the end, or one character repeated. */
export function isCommonPassword(password: string): boolean {
  const lower = password.toLowerCase();
  const stem = lower.replace(/[\d\W_]+$/u, '');
  return COMMON_PASSWORDS.has(lower) || (stem !== '' && COMMON_PASSWORDS.has(stem));
}

/** True when the password contains the e-mail address or its name part (before the @, when long enough to matter). */
export function passwordContainsEmail(password: string, email: string): boolean {
  const lower = password.toLowerCase();
  const address = email.trim().toLowerCase();
  if (!address) return false;
  const localPart = address.split('@')[0] ?? '';
  return lower.includes(address) || (localPart.length >= MIN_LOCAL_PART && lower.includes(localPart));
}

/** A new password on its own; the e-mail check needs the address, see refuseEmailInPassword. */
export const NewPassword = z
  .string()
  .min(PASSWORD_MIN, { message: PASSWORD_MESSAGES.tooShort })
  .refine((p) => utf8Length(p) <= PASSWORD_MAX_BYTES, { message: PASSWORD_MESSAGES.tooLong, abort: true })
  .refine((p) => !/^(.)\1*$/su.test(p), { message: PASSWORD_MESSAGES.repeated })
  .refine((p) => !isCommonPassword(p), { message: PASSWORD_MESSAGES.common });

/** For object schemas holding `password` next to (or alongside a known) e-mail address: the e-mail check as a field error. */
export function refuseEmailInPassword<T extends { password?: string | undefined }>(emailOf: (value: T) => string | undefined) {
  return (value: T, ctx: z.RefinementCtx) => {
    const email = emailOf(value);
    if (value.password && email && passwordContainsEmail(value.password, email)) {
      ctx.addIssue({ code: 'custom', path: ['password'], message: PASSWORD_MESSAGES.email });
    }
  };
}
