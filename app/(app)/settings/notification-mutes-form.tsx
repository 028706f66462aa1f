'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { meKeys } from '@/lib/queries/me';
import { NOTIFICATION_KIND_LABELS, NOTIFICATION_KINDS, NotificationMutes } from '@/lib/schemas/notification';

// Each box stops one kind of e-mail; the notification still shows in Stepwell either way.
export function NotificationMutesForm({ initial }: { initial: NotificationMutes }) {
  const queryClient = useQueryClient();
  const [banner, setBanner] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<NotificationMutes>({ resolver: zodResolver(NotificationMutes), defaultValues: initial });

  async function onSave(values: NotificationMutes) {
    setBanner(null);
    try {
      await apiFetch('/api/me/preferences', { method: 'PATCH', body: { notificationMutes: values } });
      await queryClient.invalidateQueries({ queryKey: meKeys.all });
      setBanner({ tone: 'success', text: 'E-mail settings saved.' });
    } catch (error) {
      const message = applyServerErrors(error, setError, NOTIFICATION_KINDS);
      if (message) setBanner({ tone: 'error', text: message });
    }
  }

  return (
    <form onSubmit={handleSubmit(onSave)} className="flex max-w-xl flex-col gap-4 rounded-lg border border-paper-edge bg-white p-5">
      {banner ? <Notice tone={banner.tone}>{banner.text}</Notice> : null}
      <fieldset>
        <legend className="text-sm font-semibold">E-mail notifications</legend>
        <p className="mt-1 text-sm text-ink-soft">Don’t e-mail me when… (you still see every notification in Stepwell)</p>
        <div className="mt-2 flex flex-col gap-1.5">
          {NOTIFICATION_KINDS.map((kind) => (
            <label key={kind} className="flex items-center gap-2 text-sm">
              <input type="checkbox" {...register(kind)} className="accent-pine-600" />
              {NOTIFICATION_KIND_LABELS[kind]}
            </label>
          ))}
        </div>
      </fieldset>
      <div>
        <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Saving…' : 'Save e-mail settings'}</Button>
      </div>
    </form>
  );
}
