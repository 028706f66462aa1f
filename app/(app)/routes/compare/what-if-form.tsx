'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { COMPACT_INPUT } from '@/components/ui/input-class';
import { MAX_TEMPERATURE_OFFSET_K, WhatIf } from '@/lib/schemas/compare';

// One change applied to every step of every compared route, recomputed on the server; nothing is saved.
export function WhatIfForm({ value, busy, onApply }: { value: WhatIf; busy: boolean; onApply: (next: WhatIf) => void }) {
  const [offset, setOffset] = useState(value.temperatureOffset_K ? String(value.temperatureOffset_K) : '');
  const [pressure, setPressure] = useState<WhatIf['standardPressure'] | ''>(value.standardPressure ?? '');
  const [error, setError] = useState<string | null>(null);

  const apply = (event: React.FormEvent) => {
    event.preventDefault();
    const candidate = { ...(offset.trim() ? { temperatureOffset_K: Number(offset) } : {}), ...(pressure ? { standardPressure: pressure } : {}) };
    const parsed = WhatIf.safeParse(candidate);
    if (!parsed.success || (offset.trim() && !Number.isFinite(Number(offset)))) {
      setError(parsed.success ? 'The temperature offset is a number of kelvin.' : (parsed.error.issues[0]?.message ?? 'Check the what-if.'));
      return;
    }
    setError(null);
    onApply(parsed.data);
  };

  return (
    <form onSubmit={apply} noValidate className="flex flex-wrap items-end gap-3" aria-label="What-if for every compared route">
      <label className="flex flex-col gap-1 text-xs font-medium">
        Temperature offset (K)
        <input className={`${COMPACT_INPUT} w-28`} inputMode="decimal" placeholder="e.g. +50" value={offset} onChange={(e) => setOffset(e.target.value)} aria-invalid={error ? true : undefined} />
      </label>
      <label className="flex flex-col gap-1 text-xs font-medium">
        Standard pressure
        <select className={`${COMPACT_INPUT} w-36`} value={pressure} onChange={(e) => setPressure(e.target.value as WhatIf['standardPressure'] | '')}>
          <option value="">as each step says</option>
          <option value="1 bar">1 bar</option>
          <option value="1 atm">1 atm</option>
        </select>
      </label>
      <Button type="submit" variant="secondary" disabled={busy}>
        {busy ? 'Recomputing…' : 'Recompute'}
      </Button>
      <p className="basis-full text-xs text-ink-faint">
        Shifts every step’s temperature by up to ±{MAX_TEMPERATURE_OFFSET_K} K, or sets one standard pressure for all, and evaluates again on the server. The saved routes stay as they are.
      </p>
      {error ? (
        <p role="alert" className="basis-full text-xs text-uphill">
          {error}
        </p>
      ) : null}
    </form>
  );
}
