import { z } from 'zod';

export const PASSWORD_MIN = 10;

const email = z.string().trim().toLowerCase().max(254).pipe(z.email({ message: 'Enter a valid e-mail address.' }));
const password = z
  .string()
  .min(PASSWORD_MIN, { message: `Use at least ${PASSWORD_MIN} characters.` })
  .max(200, { message: 'Use at most 200 characters.' });
const personName = z.string().trim().min(1, { message: 'Enter your name.' }).max(120);

export const SignInInput = z.object({ email, password: z.string().min(1).max(200) });
export type SignInInput = z.infer<typeof SignInInput>;

export const SignUpInput = z.strictObject({
  name: personName,
  email,
  password,
  teamName: z.string().trim().min(2, { message: 'Name your team (at least 2 characters).' }).max(120),
});
export type SignUpInput = z.infer<typeof SignUpInput>;

// Accepting an invitation without an account signs the person up first.
export const AcceptInvitationInput = z.strictObject({
  name: personName.optional(),
  password: password.optional(),
});
export type AcceptInvitationInput = z.infer<typeof AcceptInvitationInput>;
