import { forwardRef, type InputHTMLAttributes } from 'react';
import { PASSWORD_MAX_BYTES, PASSWORD_MIN } from '@/lib/schemas/password';
import { TextField } from './text-field';

type NewPasswordFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'autoComplete'> & { label: string; error?: string };

// A password being chosen: masked, marked for password managers as new, with the rule shown (lib/schemas/password.ts).
export const NewPasswordField = forwardRef<HTMLInputElement, NewPasswordFieldProps>(function NewPasswordField(props, ref) {
  return <TextField ref={ref} type="password" autoComplete="new-password" hint={`At least ${PASSWORD_MIN} characters, at most ${PASSWORD_MAX_BYTES} bytes; not your e-mail address or a common password.`} {...props} />;
});
