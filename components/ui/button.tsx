import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

const VARIANTS: Record<Variant, string> = {
  primary: 'bg-pine-600 text-white hover:bg-pine-700 disabled:bg-pine-500/60',
  secondary: 'border border-paper-edge bg-white text-ink hover:bg-paper-deep disabled:text-ink-faint',
  quiet: 'text-pine-700 hover:bg-pine-50 disabled:text-ink-faint',
  danger: 'border border-uphill/40 bg-white text-uphill hover:bg-uphill-bg disabled:text-ink-faint',
};

export function Button({ variant = 'primary', className = '', type = 'button', ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return (
    <button
      type={type}
      className={`inline-flex items-center justify-center gap-1.5 rounded-md px-3 py-1.5 text-sm font-medium transition-colors disabled:cursor-not-allowed ${VARIANTS[variant]} ${className}`}
      {...props}
    />
  );
}
