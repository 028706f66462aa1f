import { z } from 'zod';
import { PASSWORD_MIN } from './auth';

export const RequestPasswordResetInput = z.strictObject({
  email: z.string().trim().toLowerCase().max(254).pipe(z.email({ message: 'Enter a valid e-mail address.' })),
});
export type RequestPasswordResetInput = z.infer<typeof RequestPasswordResetInput>;

export const ResetPasswordInput = z.strictObject({
  password: z
    .string()
    .min(PASSWORD_MIN, { message: `Use at least ${PASSWORD_MIN} characters.` })
    .max(200, { message: 'Use at most 200 characters.' }),
});
export type ResetPasswordInput = z.infer<typeof ResetPasswordInput>;

/** The same answer whether or not the address has an account, so the form tells nobody who is signed up. */
export const RESET_REQUESTED_MESSAGE =
  'If an account uses that address, we have sent it a link to choose a new password. The link works once and expires in 1 hour.';
