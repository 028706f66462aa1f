'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useFieldArray, useForm, type Path } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FileInput } from '@/components/ui/file-input';
import { COMPACT_INPUT } from '@/components/ui/input-class';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ROW_COUNTING } from '@/lib/csv/row-numbers';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { fitKeys } from '@/lib/queries/fits';
import { DataSetForm, MAX_DATA_TEXT_BYTES } from '@/lib/schemas/fit-data';
import type { DataSetDto } from '@/lib/services/fits/fit-dto';
import { ScrollRegion } from '@/components/tables/scroll-region';

const SOURCES = [
  { value: 'csv', label: 'Upload CSV' },
  { value: 'paste', label: 'Paste' },
  { value: 'grid', label: 'Type in a grid' },
] as const;
const KNOWN: Path<DataSetForm>[] = ['name', 'equation', 'note', 'text'];
const EMPTY_ROWS = [0, 1, 2].map(() => ({ T: '', value: '', sigma: '' }));

// Reads a chosen file as strict UTF-8, so a spreadsheet or another encoding is refused before anything is sent.
async function readCsvFile(file: File): Promise<string> {
  if (file.size > MAX_DATA_TEXT_BYTES) throw new Error('The file is over 256 KB; split it or trim unused columns.');
  if (!/\.(csv|txt|tsv)$/i.test(file.name) && !/text|csv/.test(file.type)) throw new Error(`${file.name} is not a CSV file.`);
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(await file.arrayBuffer());
  } catch {
    throw new Error('The file is not UTF-8 text. Save it from the spreadsheet as “CSV UTF-8” and upload that.');
  }
}

/** A new data set: name, linked reaction, units, and the points from a file, pasted text or the grid. */
export function DataSetFormView({ onCreated }: { onCreated(set: DataSetDto): void }) {
  const queryClient = useQueryClient();
  const [banner, setBanner] = useState<string | null>(null);
  const [cellErrors, setCellErrors] = useState<Record<string, string>>({});
  const form = useForm<DataSetForm>({
    resolver: zodResolver(DataSetForm),
    defaultValues: { name: '', equation: '', temperatureUnit: 'K', valueKind: 'K', note: '', source: 'csv', text: '', rows: EMPTY_ROWS },
  });
  const rows = useFieldArray({ control: form.control, name: 'rows' });
  const source = form.watch('source');
  const errors = form.formState.errors;

  const create = useMutation({
    mutationFn: (v: DataSetForm) => {
      const { rows: grid, text, ...rest } = v;
      const body = v.source === 'grid' ? { ...rest, rows: (grid ?? []).filter((r) => r.T.trim() || r.value.trim()) } : { ...rest, text };
      return apiFetch<DataSetDto>('/api/fits/data-sets', { method: 'POST', body });
    },
    onSuccess: (set) => {
      void queryClient.invalidateQueries({ queryKey: fitKeys.dataSets() });
      onCreated(set);
    },
    onError: (error) => {
      setBanner(applyServerErrors(error, form.setError, KNOWN) ?? (error as Error).message);
      setCellErrors((error as { fields?: Record<string, string> }).fields ?? {});
    },
  });

  // A new file starts clean: the previous file's messages (its own, and the server's per row) go.
  const onFile = async (file: File | undefined) => {
    setBanner(null);
    setCellErrors({});
    create.reset();
    form.clearErrors('text');
    form.setValue('text', '');
    if (!file) return;
    try {
      form.setValue('text', await readCsvFile(file), { shouldValidate: true });
      form.clearErrors('text');
    } catch (err) {
      form.setError('text', { type: 'file', message: (err as Error).message });
    }
  };

  const submit = form.handleSubmit((v) => {
    setBanner(null);
    setCellErrors({});
    create.mutate(v);
  });
  const rowMessages = Object.entries(cellErrors).filter(([k]) => k.startsWith('rows'));

  return (
    <form onSubmit={submit} className="flex flex-col gap-3 rounded-md border border-paper-edge bg-white p-4" noValidate aria-label="New data set">
      {banner ? <Notice tone="error" title="The data set was not saved">{banner}</Notice> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Name" {...form.register('name')} error={errors.name?.message} />
        <TextField label="Reaction (optional)" placeholder="N2O4(g) -> 2 NO2(g)" {...form.register('equation')} error={errors.equation?.message} hint="Link the reaction to use the fit in a route step or to solve a species." />
        <label className="flex flex-col gap-1 text-sm font-medium">
          Temperature unit
          <select className={COMPACT_INPUT} {...form.register('temperatureUnit')}>
            <option value="K">K</option>
            <option value="degC">°C</option>
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">
          Second column
          <select className={COMPACT_INPUT} {...form.register('valueKind')}>
            <option value="K">K (σ, if given, in K)</option>
            <option value="lnK">ln K (σ, if given, of ln K)</option>
          </select>
        </label>
      </div>
      <TextField label="Where the numbers come from" placeholder="Notebook KR-7, p. 12" {...form.register('note')} error={errors.note?.message} />
      <fieldset className="flex gap-4 text-sm">
        <legend className="mb-1 font-medium">Points</legend>
        {SOURCES.map((s) => (
          <label key={s.value} className="flex items-center gap-1.5">
            <input type="radio" value={s.value} {...form.register('source')} /> {s.label}
          </label>
        ))}
      </fieldset>
      {source === 'csv' ? (
        <FileInput label="CSV file: temperature, K or ln K, and optionally σ; a header row is fine" accept=".csv,.txt,.tsv,text/csv" hint={ROW_COUNTING} onFile={(file) => void onFile(file)} />
      ) : null}
      {source === 'paste' ? <textarea aria-label="Pasted table" rows={8} className={COMPACT_INPUT} placeholder={'T,K\n300,0.18\n320,0.75'} {...form.register('text')} /> : null}
      {source !== 'grid' && errors.text?.message ? <p className="text-sm text-uphill">{errors.text.message}</p> : null}
      {source === 'grid' ? (
        <ScrollRegion label="Points to enter">
          <table className="text-sm">
            <thead>
              <tr className="text-left text-ink-soft">
                <th className="font-medium">#</th>
                <th className="font-medium">T</th>
                <th className="font-medium">K or ln K</th>
                <th className="font-medium">σ (optional)</th>
              </tr>
            </thead>
            <tbody>
              {rows.fields.map((f, i) => (
                <tr key={f.id}>
                  <td className="pr-2 text-ink-soft">{i + 1}</td>
                  {(['T', 'value', 'sigma'] as const).map((c) => (
                    <td key={c} className="pr-2">
                      <input aria-label={`Row ${i + 1} ${c}`} aria-invalid={cellErrors[`rows.${i}.${c}`] ? true : undefined} className={COMPACT_INPUT} {...form.register(`rows.${i}.${c}`)} />
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      ) : null}
      {source === 'grid' ? (
        <Button variant="quiet" className="self-start" onClick={() => rows.append({ T: '', value: '', sigma: '' })}>
          Add a row
        </Button>
      ) : null}
      {rowMessages.length ? (
        <ul className="list-disc pl-5 text-sm text-uphill" aria-label="Problems in the table">
          {rowMessages.map(([k, m]) => (
            <li key={k}>{m}</li>
          ))}
          {source === 'grid' ? null : <li className="list-none text-xs text-ink-soft">{ROW_COUNTING}</li>}
        </ul>
      ) : null}
      <Button type="submit" className="self-start" disabled={create.isPending}>
        {create.isPending ? 'Saving…' : 'Save data set'}
      </Button>
    </form>
  );
}
