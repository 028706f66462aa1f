'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { useForm, type Path } from 'react-hook-form';
import { StructureImage } from '@/components/chemistry/structure-image';
import { speciesHref } from '@/components/tables/species-columns';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { createTeamSpecies, previewSpeciesImpact, speciesKeys, updateTeamSpecies } from '@/lib/queries/species';
import { TeamSpeciesForm as FormSchema, toTeamSpeciesInput, type TeamSpeciesForm as FormValues } from '@/lib/schemas/species';
import type { RouteImpact } from '@/lib/services/species/species-impact';
import type { TeamSpeciesDto } from '@/lib/services/species/species-dto';
import { ENERGY_UNITS, ENTROPY_UNITS } from '@/lib/species/units';
import { RouteImpactList } from './route-impact-list';
import { SelectField } from './select-field';

const num = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? null : typeof v === 'number' ? v : Number(String(v).replace('−', '-'))) };
const KNOWN: Path<FormValues>[] = ['formula', 'phase', 'form', 'name', 'aliases', 'dfH', 'dfG', 'S', 'Cp', 'cpTmin_K', 'cpTmax_K', 'sigmaDfH', 'sigmaDfG', 'sigmaS', 'provenanceText', 'notes', 'smiles'];
const TEXT_LABEL = { citation: 'Citation', measured: 'Data set or notebook reference', estimated: 'Estimation method' } as const;
const TEXT_HINT = {
  citation: 'Authors, title, journal, year, table or page.',
  measured: 'Where the raw data are: a data set, a notebook page, a saved fit.',
  estimated: 'The method and where the working is, e.g. “Benson group additivity, sheet 4”.',
} as const;

export function toFormValues(s: TeamSpeciesDto): FormValues {
  const p = s.provenance;
  return {
    formula: s.formula, phase: s.phase, form: s.form, name: s.name, aliases: s.aliases.filter((a) => a !== s.name),
    energyUnit: 'kJ/mol', entropyUnit: 'J/(mol K)', dfH: s.dfH_kJ, dfG: s.dfGDerived ? null : s.dfG_kJ, S: s.S_J_per_K, Cp: s.Cp_J_per_K,
    cpTmin_K: s.Cp_J_per_K === null ? null : s.cpTmin_K, cpTmax_K: s.Cp_J_per_K === null ? null : s.cpTmax_K,
    sigmaDfH: s.sigmaDfH_kJ, sigmaDfG: s.sigmaDfG_kJ, sigmaS: s.sigmaS_J_per_K,
    provenanceKind: p.kind, provenanceText: p.kind === 'citation' ? p.citation : p.kind === 'measured' ? p.reference : p.method,
    fitId: p.kind === 'measured' ? p.fitId : null, notes: s.notes, smiles: s.smiles ?? '',
  };
}

const BLANK: FormValues = {
  formula: '', phase: 'g', form: null, name: '', aliases: [], energyUnit: 'kJ/mol', entropyUnit: 'J/(mol K)',
  dfH: null as unknown as number, dfG: null, S: null as unknown as number, Cp: null, cpTmin_K: null, cpTmax_K: null,
  sigmaDfH: null, sigmaDfG: null, sigmaS: null, provenanceKind: 'citation', provenanceText: '', fitId: null, notes: '', smiles: '',
};

/** Adds a team species, or edits one (`existing`), with units and required provenance; an edit can first show which routes change. */
export function TeamSpeciesFormView({ existing, onVersion }: { existing?: TeamSpeciesDto; onVersion?: (version: number) => void }) {
  const queryClient = useQueryClient();
  const [formError, setFormError] = useState<string | null>(null);
  const [impact, setImpact] = useState<{ list: RouteImpact[]; done: boolean } | null>(null);
  const [saved, setSaved] = useState<{ key: string; warnings: string[] } | null>(null);
  // The version this form last saw; a save moves it on, so a second save in a row is not refused as stale.
  const [version, setVersion] = useState(existing?.version ?? 0);
  const { register, handleSubmit, setError, watch, formState } = useForm<FormValues>({
    resolver: zodResolver(FormSchema),
    defaultValues: existing ? toFormValues(existing) : BLANK,
  });
  const errors = formState.errors;
  const kind = watch('provenanceKind');
  const energyUnit = watch('energyUnit');
  const entropyUnit = watch('entropyUnit');
  const phase = watch('phase');

  async function onSave(values: FormValues) {
    setFormError(null);
    try {
      const parsed = FormSchema.parse(values);
      const input = toTeamSpeciesInput(parsed);
      if (existing) {
        const answer = await updateTeamSpecies(existing.id, version, input, parsed.smiles || null);
        setVersion(answer.species.version);
        onVersion?.(answer.species.version);
        setImpact({ list: answer.impact, done: true });
        setSaved({ key: answer.species.key, warnings: answer.warnings });
      } else {
        const made = await createTeamSpecies(input);
        setSaved({ key: made.key, warnings: made.warnings });
      }
      await queryClient.invalidateQueries({ queryKey: speciesKeys.all });
    } catch (error) {
      setFormError(applyServerErrors(error, setError, KNOWN));
    }
  }

  async function onPreview(values: FormValues) {
    setFormError(null);
    try {
      const parsed = FormSchema.parse(values);
      const answer = await previewSpeciesImpact({ species: toTeamSpeciesInput(parsed), teamSpeciesId: existing?.id ?? null, ...(existing ? { smiles: parsed.smiles || null } : {}) });
      setImpact({ list: answer.impact, done: false });
    } catch (error) {
      setFormError(applyServerErrors(error, setError, KNOWN));
    }
  }

  if (saved && !existing) {
    return (
      <Notice tone="success" title={`${saved.key} added to your team`}>
        {saved.warnings.map((w) => <p key={w}>{w}</p>)}
        <Link href={speciesHref(saved.key)} className="underline">See its values and plots</Link>
      </Notice>
    );
  }

  const e = (name: keyof typeof errors) => errors[name]?.message as string | undefined;
  return (
    <form onSubmit={handleSubmit(onSave)} className="flex max-w-3xl flex-col gap-4" noValidate>
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      {saved && existing ? (
        <Notice tone="success" title="Saved">
          {saved.warnings.map((w) => <p key={w}>{w}</p>)}
          <Link href={speciesHref(saved.key)} className="underline">See the species</Link>
        </Notice>
      ) : null}
      <fieldset className="grid gap-3 sm:grid-cols-3">
        <legend className="mb-1 text-sm font-semibold">Species</legend>
        <TextField label="Formula" placeholder="C7H6O3" hint="Charges sign-first: SO4-2, NH4+." error={e('formula')} {...register('formula')} />
        <SelectField label="Phase" error={e('phase')} {...register('phase')} options={[['g', 'gas (g)'], ['l', 'liquid (l)'], ['s', 'solid (s)'], ['aq', 'aqueous (aq)']]} />
        {phase === 's' ? <TextField label="Solid form (optional)" placeholder="e.g. diamond" error={e('form')} {...register('form', { setValueAs: (v: string | null) => (v ? v : null) })} /> : <span />}
        <TextField label="Name" placeholder="salicylic acid" error={e('name')} {...register('name')} className="sm:col-span-2" />
        <TextField label="Other names (comma-separated)" error={e('aliases')} {...register('aliases', { setValueAs: (v: string | string[]) => (Array.isArray(v) ? v : v.split(',').map((a) => a.trim()).filter(Boolean)) })} />
      </fieldset>
      {existing ? (
        <fieldset className="flex flex-wrap items-start gap-3">
          <legend className="mb-1 text-sm font-semibold">Structure</legend>
          {existing.smiles ? <StructureImage smiles={existing.smiles} name={existing.name} formula={existing.formula} width={120} height={90} className="rounded border border-paper-edge bg-white" /> : null}
          <TextField
            label="SMILES"
            className="min-w-0 flex-1"
            spellCheck={false}
            autoComplete="off"
            hint="Steps that give this structure (by SMILES or name) use this species. It must match the formula; clear it to know the species by its formula only."
            error={e('smiles')}
            {...register('smiles')}
          />
        </fieldset>
      ) : null}
      <fieldset className="grid gap-3 sm:grid-cols-3">
        <legend className="mb-1 text-sm font-semibold">Values at 298.15 K and 1 bar</legend>
        <SelectField label="Energy unit" {...register('energyUnit')} options={ENERGY_UNITS.map((u) => [u, u])} />
        <SelectField label="Entropy and Cp° unit" {...register('entropyUnit')} options={ENTROPY_UNITS.map((u) => [u, u])} />
        <span />
        <TextField label={`ΔfH° (${energyUnit})`} inputMode="decimal" error={e('dfH')} {...register('dfH', num)} />
        <TextField label={`ΔfG° (${energyUnit})`} inputMode="decimal" hint="Leave blank to derive it from ΔfH° and S°." error={e('dfG')} {...register('dfG', num)} />
        <TextField label={`S° (${entropyUnit})`} inputMode="decimal" error={e('S')} {...register('S', num)} />
        <TextField label={`σ(ΔfH°) (${energyUnit})`} inputMode="decimal" hint="Optional." error={e('sigmaDfH')} {...register('sigmaDfH', num)} />
        <TextField label={`σ(ΔfG°) (${energyUnit})`} inputMode="decimal" hint="Optional." error={e('sigmaDfG')} {...register('sigmaDfG', num)} />
        <TextField label={`σ(S°) (${entropyUnit})`} inputMode="decimal" hint="Optional." error={e('sigmaS')} {...register('sigmaS', num)} />
        <TextField label={`Cp° (${entropyUnit})`} inputMode="decimal" hint="Optional; taken as constant." error={e('Cp')} {...register('Cp', num)} />
        <TextField label="Cp° good from (K)" inputMode="decimal" hint="Blank: 298.15 ± 100 K." error={e('cpTmin_K')} {...register('cpTmin_K', num)} />
        <TextField label="Cp° good to (K)" inputMode="decimal" error={e('cpTmax_K')} {...register('cpTmax_K', num)} />
      </fieldset>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-semibold">Where the values come from</legend>
        <div className="flex flex-wrap gap-4 text-sm" role="radiogroup" aria-label="Kind of provenance">
          {(['citation', 'measured', 'estimated'] as const).map((k) => (
            <label key={k} className="flex items-center gap-1.5">
              <input type="radio" value={k} {...register('provenanceKind')} />
              {k === 'citation' ? 'From a publication' : k === 'measured' ? 'Measured by us' : 'Estimated'}
            </label>
          ))}
        </div>
        <TextField label={TEXT_LABEL[kind]} hint={TEXT_HINT[kind]} error={e('provenanceText')} {...register('provenanceText')} />
        <TextAreaField label="Notes (optional)" rows={3} error={e('notes')} {...register('notes')} />
      </fieldset>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Saving…' : existing ? 'Save changes' : 'Add to my team'}</Button>
        <Button variant="secondary" onClick={handleSubmit(onPreview)} disabled={formState.isSubmitting}>Which routes would change?</Button>
        <Link href={existing ? speciesHref(existing.key) : '/species'} className="px-3 py-1.5 text-sm text-pine-700 underline-offset-2 hover:underline">Cancel</Link>
      </div>
      {impact ? <RouteImpactList impact={impact.list} done={impact.done} /> : null}
    </form>
  );
}
