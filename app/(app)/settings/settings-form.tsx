'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { meKeys, useProfile } from '@/lib/queries/me';
import { ENERGY_UNITS, PRESSURE_UNITS, PreferencesInput, TEMPERATURE_UNITS } from '@/lib/schemas/preferences';
import { NotificationMutesForm } from './notification-mutes-form';
import { SignOutEverywhere } from './sign-out-everywhere';

const LABELS: Record<string, string> = { kJ: 'kJ/mol', kcal: 'kcal/mol', K: 'kelvin (K)', degC: 'degrees Celsius (°C)', bar: 'bar', atm: 'atm', kPa: 'kPa' };

export function SettingsForm() {
  const { data: profile } = useProfile();
  if (!profile) return <p className="text-sm text-ink-soft">Loading…</p>;
  return (
    <div className="flex flex-col gap-6">
      <UnitsForm initial={profile.preferences} />
      <NotificationMutesForm initial={profile.notificationMutes} />
      <SignOutEverywhere />
    </div>
  );
}

function UnitsForm({ initial }: { initial: PreferencesInput }) {
  const queryClient = useQueryClient();
  const [banner, setBanner] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<PreferencesInput>({ resolver: zodResolver(PreferencesInput), defaultValues: initial });

  async function onSave(values: PreferencesInput) {
    setBanner(null);
    try {
      await apiFetch('/api/me/preferences', { method: 'PATCH', body: values });
      await queryClient.invalidateQueries({ queryKey: meKeys.all });
      setBanner({ tone: 'success', text: 'Units saved.' });
    } catch (error) {
      const message = applyServerErrors(error, setError, ['energyUnit', 'temperatureUnit', 'pressureUnit']);
      if (message) setBanner({ tone: 'error', text: message });
    }
  }

  const groups = [
    { name: 'energyUnit', legend: 'Energy', options: ENERGY_UNITS },
    { name: 'temperatureUnit', legend: 'Temperature', options: TEMPERATURE_UNITS },
    { name: 'pressureUnit', legend: 'Pressure', options: PRESSURE_UNITS },
  ] as const;

  return (
    <form onSubmit={handleSubmit(onSave)} className="flex max-w-xl flex-col gap-4 rounded-lg border border-paper-edge bg-white p-5">
      {banner ? <Notice tone={banner.tone}>{banner.text}</Notice> : null}
      {groups.map((group) => (
        <fieldset key={group.name}>
          <legend className="text-sm font-semibold">{group.legend}</legend>
          <div className="mt-1 flex flex-wrap gap-4">
            {group.options.map((option) => (
              <label key={option} className="flex items-center gap-1.5 text-sm">
                <input type="radio" value={option} {...register(group.name)} className="accent-pine-600" />
                {LABELS[option]}
              </label>
            ))}
          </div>
        </fieldset>
      ))}
      <div>
        <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Saving…' : 'Save units'}</Button>
      </div>
    </form>
  );
}
