import type { ReactNode } from 'react';

type Tone = 'error' | 'info' | 'success' | 'caution';

const TONES: Record<Tone, string> = {
  error: 'border-uphill/40 bg-uphill-bg text-uphill',
  info: 'border-pine-100 bg-pine-50 text-pine-700',
  success: 'border-downhill/30 bg-downhill-bg text-downhill',
  caution: 'border-brass-500/40 bg-brass-100 text-brass-700',
};

export function Notice({ tone = 'info', title, children }: { tone?: Tone; title?: string; children?: ReactNode }) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-md border px-3 py-2 text-sm ${TONES[tone]}`}>
      {title ? <p className="font-semibold">{title}</p> : null}
      {children ? <div className={title ? 'mt-0.5' : ''}>{children}</div> : null}
    </div>
  );
}
