'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { FileInput } from '@/components/ui/file-input';
import { Notice } from '@/components/ui/notice';
import { ROW_COUNTING } from '@/lib/csv/row-numbers';
import { ApiError } from '@/lib/queries/api-fetch';
import { commitSpeciesImport, speciesKeys, uploadSpeciesCsv } from '@/lib/queries/species';
import type { DuplicateChoice } from '@/lib/schemas/species';
import type { ImportPreviewDto } from '@/lib/services/species/import-preview';
import { EXAMPLE_HEADER } from '@/lib/species/csv-columns';
import { MAX_IMPORT_BYTES, MAX_IMPORT_ROWS } from '@/lib/species/import-limits';
import { ImportPreviewTable } from '../_components/import-preview-table';

function problemsOf(error: unknown): string[] {
  if (!(error instanceof ApiError)) return ['Something went wrong. Try again.'];
  const listed = error.details?.listed ?? error.details?.problems;
  return Array.isArray(listed) && listed.length ? [error.message, ...listed.map(String)] : [error.message];
}

export function SpeciesImportClient() {
  const queryClient = useQueryClient();
  const [preview, setPreview] = useState<ImportPreviewDto | null>(null);
  const [choices, setChoices] = useState<Record<string, DuplicateChoice>>({});
  const [localError, setLocalError] = useState<string | null>(null);
  const upload = useMutation({ mutationFn: uploadSpeciesCsv, onSuccess: (p) => { setPreview(p); setChoices({}); } });
  const commit = useMutation({
    mutationFn: () => commitSpeciesImport(preview!.id, { choices, otherwise: null }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: speciesKeys.all }),
  });

  // A new choice starts clean: no message from the previous file stays on screen.
  function handleFile(file: File | undefined) {
    setLocalError(null);
    setPreview(null);
    upload.reset();
    commit.reset();
    if (!file) return;
    // Checked here too so a large file is not sent at all.
    if (file.size > MAX_IMPORT_BYTES) return setLocalError(`${file.name} is ${(file.size / 1024 / 1024).toFixed(1)} MB; one import takes at most 2 MB. Split it into smaller files.`);
    upload.mutate(file);
  }

  const duplicates = preview?.rows.filter((r) => r.duplicate && r.key) ?? [];
  const undecided = duplicates.filter((r) => !choices[r.key!]).length;
  const withErrors = preview?.counts.withErrors ?? 0;
  const setAll = (choice: DuplicateChoice) => setChoices(Object.fromEntries(duplicates.map((r) => [r.key!, choice])));

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-col gap-1 text-sm text-ink-soft">
        <p>One species a row, at most {MAX_IMPORT_ROWS.toLocaleString('en-GB')} rows and 2 MB, saved as CSV UTF-8. The header names the columns and their units:</p>
        <code className="block overflow-x-auto rounded bg-paper-deep px-2 py-1 text-xs text-ink">{EXAMPLE_HEADER}</code>
        <p>Leave ΔfG° blank to derive it from ΔfH° and S°. Provenance is citation, measured or estimated; the reference column says which publication, data set or method.</p>
      </div>
      <FileInput label="CSV file" accept=".csv,text/csv" hint={`At most 2 MB. ${ROW_COUNTING}`} onFile={handleFile} disabled={upload.isPending || commit.isPending} />
      {upload.isPending ? <p role="status" className="text-sm text-ink-soft">Checking the file…</p> : null}
      {localError ? <Notice tone="error">{localError}</Notice> : null}
      {upload.isError ? <Notice tone="error" title="The file was not accepted">{problemsOf(upload.error).map((p) => <p key={p}>{p}</p>)}</Notice> : null}
      {preview && !commit.isSuccess ? (
        <section aria-labelledby="preview" className="flex flex-col gap-3">
          <h2 id="preview" className="break-words text-base font-semibold">{preview.fileName}: {preview.counts.rows} rows</h2>
          <p className="text-sm text-ink-soft">
            {withErrors ? `${withErrors} row${withErrors > 1 ? 's have' : ' has'} errors; fix the file and upload it again. ` : 'Every row passed its checks. '}
            {duplicates.length ? `${duplicates.length} species already exist${duplicates.length > 1 ? '' : 's'}: choose for each.` : ''}
            <span className="block break-all text-xs text-ink-faint">SHA-256 {preview.checksum}</span>
          </p>
          {duplicates.length ? (
            <div className="flex flex-wrap gap-2">
              <Button variant="secondary" onClick={() => setAll('skip')}>Skip all duplicates</Button>
              <Button variant="secondary" onClick={() => setAll('override')}>Override all duplicates</Button>
            </div>
          ) : null}
          <ImportPreviewTable rows={preview.rows} choices={choices} onChoice={(key, c) => setChoices((all) => ({ ...all, [key]: c }))} disabled={commit.isPending} />
          {commit.isError ? <Notice tone="error" title="Nothing was imported">{problemsOf(commit.error).map((p) => <p key={p}>{p}</p>)}</Notice> : null}
          <div className="flex flex-wrap items-center gap-3">
            <Button onClick={() => commit.mutate()} disabled={withErrors > 0 || undecided > 0 || commit.isPending}>
              {commit.isPending ? 'Importing…' : `Import ${preview.counts.rows} rows`}
            </Button>
            {undecided > 0 && withErrors === 0 ? <span className="text-sm text-ink-soft">Choose skip or override for {undecided} more duplicate{undecided > 1 ? 's' : ''}.</span> : null}
          </div>
        </section>
      ) : null}
      {commit.isSuccess ? (
        <Notice tone="success" title="Imported">
          {commit.data.created} added, {commit.data.overridden} overridden, {commit.data.skipped} skipped.{' '}
          <Link href="/species" className="underline">Back to the species</Link>
        </Notice>
      ) : null}
    </div>
  );
}
