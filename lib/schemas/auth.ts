import { z } from 'zod';
import { NewPassword, refuseEmailInPassword } from './password';

export { PASSWORD_MIN } from './password';

const email = z.string().trim().toLowerCase().max(254).pipe(z.email({ message: 'Enter a valid e-mail address.' }));
const personName = z.string().trim().min(1, { message: 'Enter your name.' }).max(120);

// Signing in takes any password an account may have, so ones set before today's rules still work.
export const SignInInput = z.object({ email, password: z.string().min(1).max(200) });
export type SignInInput = z.infer<typeof SignInInput>;

export const SignUpInput = z
  .strictObject({
    name: personName,
    email,
    password: NewPassword,
    teamName: z.string().trim().min(2, { message: 'Name your team (at least 2 characters).' }).max(120),
  })
  .superRefine(refuseEmailInPassword((v) => v.email));
export type SignUpInput = z.infer<typeof SignUpInput>;

// Accepting an invitation without an account signs the person up first. The address comes from the invitation, so
// the form adds the e-mail check with refuseEmailInPassword and the service checks it again.
export const AcceptInvitationInput = z.strictObject({
  name: personName.optional(),
  password: NewPassword.optional(),
});
export type AcceptInvitationInput = z.infer<typeof AcceptInvitationInput>;
