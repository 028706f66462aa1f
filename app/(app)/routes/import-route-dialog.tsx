'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { FileInput } from '@/components/ui/file-input';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/queries/api-fetch';
import { importRouteFile, routeKeys } from '@/lib/queries/routes';

/** Checked before reading, so a wrong file never goes to the server. */
export const MAX_ROUTE_FILE_BYTES = 1024 * 1024;

export type RouteFileRead = { ok: true; json: Record<string, unknown> } | { ok: false; message: string };

const sizeText = (bytes: number) => (bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(1)} MB` : `${Math.ceil(bytes / 1024)} KB`);

/** Reads a chosen file as route JSON: too large, empty, not JSON or not one object each get their own message. */
export async function readRouteFile(file: File): Promise<RouteFileRead> {
  if (file.size > MAX_ROUTE_FILE_BYTES) return { ok: false, message: `“${file.name}” is ${sizeText(file.size)}; a route file can be at most 1 MB. Nothing was sent.` };
  const text = await file.text();
  if (text.trim() === '') return { ok: false, message: `“${file.name}” is empty. Nothing was sent.` };
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    const detail = error instanceof Error ? ` (${error.message})` : '';
    return { ok: false, message: `“${file.name}” is not valid JSON${detail}. Nothing was sent.` };
  }
  if (typeof json !== 'object' || json === null || Array.isArray(json)) {
    return { ok: false, message: `“${file.name}” is JSON, but not a route file: a route file is one object with a target and its steps. Nothing was sent.` };
  }
  return { ok: true, json: json as Record<string, unknown> };
}

/** "steps.2.equation" → "Step 3 (“s3”), equation": the server's field paths in words, with the step's id from the file. */
export function describeImportField(path: string, file?: Record<string, unknown>): string {
  if (path === '_' || path === '') return 'The file';
  const [head, index, ...rest] = path.split('.');
  const tail = rest.length ? `, ${rest.join(' › ')}` : '';
  if ((head === 'steps' || head === 'links') && index !== undefined && /^\d+$/.test(index)) {
    const n = Number(index);
    if (head === 'links') return `Link ${n + 1}${tail}`;
    const steps = file?.steps;
    const id = Array.isArray(steps) ? (steps[n] as { id?: unknown } | undefined)?.id : undefined;
    return `Step ${n + 1}${typeof id === 'string' && id ? ` (“${id}”)` : ''}${tail}`;
  }
  return path.split('.').join(' › ');
}

export function ImportRouteDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} title="Import route JSON" onClose={onClose}>
      <ImportRouteForm onCancel={onClose} />
    </Dialog>
  );
}

function ImportRouteForm({ onCancel }: { onCancel: () => void }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [read, setRead] = useState<(RouteFileRead & { name: string }) | null>(null);
  const upload = useMutation({
    mutationFn: (json: Record<string, unknown>) => importRouteFile(json),
    onSuccess: async (route) => {
      await queryClient.invalidateQueries({ queryKey: routeKeys.lists() });
      router.push(`/routes/${route.id}`);
    },
  });

  async function handleFile(file: File | undefined) {
    upload.reset();
    setRead(file ? { ...(await readRouteFile(file)), name: file.name } : null);
  }

  const json = read?.ok ? read.json : undefined;
  const error = upload.error;
  const fields = error instanceof ApiError ? Object.entries(error.fields ?? {}) : [];
  return (
    <form
      className="flex flex-col gap-3"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        if (json) upload.mutate(json);
      }}
    >
      <p className="text-sm text-ink-soft">
        A route file is the JSON Stepwell exports for a route: the route request the command-line tool reads, plus the board’s name, notes and positions. The new route
        lands in your team as a draft.
      </p>
      <FileInput label="Route file" accept=".json,application/json" hint="A .json file of at most 1 MB." onFile={(file) => void handleFile(file)} />

      <div aria-live="polite" className="flex flex-col gap-2">
        {read && !read.ok ? <Notice tone="error">{read.message}</Notice> : null}
        {error ? (
          <Notice tone="error" title={fields.length ? 'The file was not imported; nothing was created' : undefined}>
            {fields.length ? (
              <ul className="mt-1 list-disc pl-4">
                {fields.map(([path, message]) => (
                  <li key={path}>
                    <span className="font-medium">{describeImportField(path, json)}:</span> {message}
                  </li>
                ))}
              </ul>
            ) : error instanceof ApiError ? (
              error.message
            ) : (
              'The file could not be sent. Try again.'
            )}
          </Notice>
        ) : null}
      </div>

      <div className="mt-1 flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" disabled={!json || upload.isPending || upload.isSuccess}>
          {upload.isPending || upload.isSuccess ? 'Importing…' : 'Import route'}
        </Button>
      </div>
    </form>
  );
}
