'use client';

// Step one: paste a SMILES or a molfile (or open a .mol file) and pick the phase. Errors from the engine land on the
// structure field: an unreadable SMILES with its position, the atoms or groups no method covers, the size limits.
import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/lib/queries/api-fetch';
import type { StructureRequest } from '@/lib/queries/species-structure';
import { MAX_MOLFILE_CHARS } from '@/lib/schemas/species-structure';
import { SelectField } from '../_components/select-field';

export const PHASE_OPTIONS = [['l', 'liquid (l)'], ['g', 'gas (g)'], ['aq', 'aqueous, 1 mol/L (aq)'], ['s', 'solid (s): no estimate, enter values']] as const;
type Phase = StructureRequest['phase'];
type Mode = 'smiles' | 'molfile';

/** The engine's refusal in words for the structure field, with the atoms or groups it could not place when it names them. */
export function structureErrorText(error: unknown): string | null {
  if (!(error instanceof ApiError)) return error ? 'The structure could not be checked. Try again.' : null;
  if (!['INVALID_STRUCTURE', 'UNSUPPORTED_STRUCTURE', 'VALIDATION', 'PAYLOAD_TOO_LARGE', 'UNKNOWN_SPECIES'].includes(error.code)) return null;
  const field = Object.entries(error.fields ?? {}).find(([k]) => /smiles|molfile/.test(k))?.[1];
  const atoms = error.details?.uncoveredAtoms;
  const list = Array.isArray(atoms)
    ? atoms.map((a) => (typeof a === 'object' && a && 'element' in a ? `${String((a as { element: unknown }).element)} (atom ${Number((a as { index?: number }).index ?? 0) + 1})` : String(a))).join(', ')
    : null;
  return `${field ?? error.message}${list ? ` Not covered: ${list}.` : ''}`;
}

export function StructureInput({ initialSmiles, initialPhase, isPending, error, onSubmit, autoFocus = false }: {
  initialSmiles: string; initialPhase: Phase; isPending: boolean; error: string | null; onSubmit: (request: StructureRequest) => void;
  /** in a dialog: the SMILES field takes the focus once the flow has loaded */
  autoFocus?: boolean;
}) {
  const fileId = useId();
  const [mode, setMode] = useState<Mode>('smiles');
  const [smiles, setSmiles] = useState(initialSmiles);
  const [molfile, setMolfile] = useState('');
  const [phase, setPhase] = useState<Phase>(initialPhase);
  const [local, setLocal] = useState<string | null>(null);
  const smilesField = useRef<HTMLInputElement>(null);
  // A frame later: a modal dialog focuses its first control when it opens, which would otherwise win.
  useEffect(() => {
    if (!autoFocus) return;
    const frame = requestAnimationFrame(() => smilesField.current?.focus());
    return () => cancelAnimationFrame(frame);
  }, [autoFocus]);

  function handleSubmit(event: FormEvent) {
    event.preventDefault();
    const text = mode === 'smiles' ? smiles.trim() : molfile;
    if (!text.trim()) return setLocal(mode === 'smiles' ? 'Paste a SMILES, e.g. CC(C)(C)OC(=O)NCCO.' : 'Paste a molfile, or open a .mol file.');
    if (mode === 'smiles' && text.length > 600) return setLocal(`A SMILES may be at most 600 characters; this one has ${text.length}.`);
    if (mode === 'molfile' && text.length > MAX_MOLFILE_CHARS) return setLocal(`A molfile may be at most ${MAX_MOLFILE_CHARS.toLocaleString('en')} characters.`);
    setLocal(null);
    onSubmit(mode === 'smiles' ? { smiles: text, phase } : { molfile: text, phase });
  }

  async function handleFile(file: File | undefined) {
    if (!file) return;
    if (file.size > MAX_MOLFILE_CHARS) return setLocal(`That file is over ${MAX_MOLFILE_CHARS.toLocaleString('en')} bytes; a molfile of one molecule is far smaller.`);
    setMolfile(await file.text());
  }

  const shown = local ?? error ?? undefined;
  return (
    <form onSubmit={handleSubmit} className="flex max-w-3xl flex-col gap-3" noValidate aria-label="Structure">
      <fieldset className="flex flex-wrap gap-4 text-sm">
        <legend className="mb-1 text-sm font-semibold">Structure as</legend>
        {(['smiles', 'molfile'] as const).map((m) => (
          <label key={m} className="flex items-center gap-1.5">
            <input type="radio" name="structure-mode" value={m} checked={mode === m} onChange={() => setMode(m)} />
            {m === 'smiles' ? 'SMILES' : 'Molfile (MDL V2000 or V3000)'}
          </label>
        ))}
      </fieldset>
      {mode === 'smiles' ? (
        <TextField
          label="SMILES"
          value={smiles}
          onChange={(e) => setSmiles(e.target.value)}
          placeholder="CC(C)(C)OC(=O)NC(C)(C)CO"
          spellCheck={false}
          autoComplete="off"
          ref={smilesField}
          hint="One molecule, up to 150 heavy atoms. Copy it from your drawing program or notebook."
          error={shown}
        />
      ) : (
        <div className="flex flex-col gap-1">
          <TextAreaField
            label="Molfile"
            rows={8}
            value={molfile}
            onChange={(e) => setMolfile(e.target.value)}
            spellCheck={false}
            hint="Paste the whole file, down to its “M  END” line. Hydrogens drawn as atoms are fine."
            error={shown}
          />
          <label htmlFor={fileId} className="text-xs text-ink-soft">
            or open a .mol file{' '}
            <input id={fileId} type="file" accept=".mol,.sdf,chemical/x-mdl-molfile,text/plain" onChange={(e) => void handleFile(e.target.files?.[0])} className="text-xs" />
          </label>
        </div>
      )}
      <div className="grid gap-3 sm:grid-cols-3">
        <SelectField label="Phase" value={phase} onChange={(e) => setPhase(e.target.value as Phase)} options={PHASE_OPTIONS} />
      </div>
      <div>
        <Button type="submit" disabled={isPending}>{isPending ? 'Estimating…' : 'Show the estimate'}</Button>
      </div>
    </form>
  );
}
