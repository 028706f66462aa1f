import { forwardRef, type InputHTMLAttributes } from 'react';
import { PASSWORD_MIN } from '@/lib/schemas/auth';
import { TextField } from './text-field';

type NewPasswordFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'autoComplete'> & { label: string; error?: string };

// A password being chosen: masked, marked for password managers as new, with the length rule shown.
export const NewPasswordField = forwardRef<HTMLInputElement, NewPasswordFieldProps>(function NewPasswordField(props, ref) {
  return <TextField ref={ref} type="password" autoComplete="new-password" hint={`At least ${PASSWORD_MIN} characters.`} {...props} />;
});
