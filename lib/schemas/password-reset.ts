import { z } from 'zod';
import { NewPassword } from './password';

export const RequestPasswordResetInput = z.strictObject({
  email: z.string().trim().toLowerCase().max(254).pipe(z.email({ message: 'Enter a valid e-mail address.' })),
});
export type RequestPasswordResetInput = z.infer<typeof RequestPasswordResetInput>;

// The link does not name the account, so the e-mail check runs in the service (resetPassword).
export const ResetPasswordInput = z.strictObject({ password: NewPassword });
export type ResetPasswordInput = z.infer<typeof ResetPasswordInput>;

/** The same answer whether or not the address has an account, so the form tells nobody who is signed up. */
export const RESET_REQUESTED_MESSAGE =
  'If an account uses that address, we have sent it a link to choose a new password. The link works once and expires in 1 hour.';
