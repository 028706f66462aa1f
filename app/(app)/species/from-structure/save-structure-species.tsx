'use client';

// Step three: keep the structure as a team species: the estimate as it stands (method and σ recorded), values the
// team measured or cited, or values solved from a saved van 't Hoff fit; either of the last two overrides the estimate.
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm, type Path } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { equationSpecies } from '@/lib/route-editor/equation-species';
import { savedFitsQuery } from '@/lib/queries/fits';
import { routeKeys } from '@/lib/queries/routes';
import { speciesKeys } from '@/lib/queries/species';
import { createSpeciesFromStructure, type StructureRequest } from '@/lib/queries/species-structure';
import { StructureSaveForm, toStructureRequest } from '@/lib/schemas/species-structure';
import type { TeamSpeciesDto } from '@/lib/services/species/species-dto';
import { SelectField } from '../_components/select-field';
import { EnteredValuesFields, toNumber } from './entered-values-fields';

type Choice = StructureSaveForm['choice'];
const KNOWN = ['name', 'aliasesText', 'notes', 'dfH', 'dfG', 'S', 'Cp', 'cpTmin_K', 'cpTmax_K', 'sigmaDfH', 'sigmaDfG', 'sigmaS', 'provenanceText', 'fitId', 'fitSpecies'] as Path<StructureSaveForm>[];
// The API names some fields by their place in the request body; the form has them flat.
const SERVER_FIELD: Record<string, string> = { 'source.fitId': 'fitId', 'source.species': 'fitSpecies', aliases: 'aliasesText' };

const CHOICE_TEXT: Record<Choice, string> = {
  estimate: 'Save the estimate (provenance “estimated”, with its method and σ)',
  entered: 'Enter measured or published values instead',
  fit: 'Solve the values from a saved van ’t Hoff fit',
};

export function SaveStructureSpecies({ request, suggestedName, canEstimate, overridesLibrary, onSaved }: {
  request: StructureRequest; suggestedName: string; canEstimate: boolean; overridesLibrary: boolean; onSaved: (saved: TeamSpeciesDto & { warnings: string[] }) => void;
}) {
  const queryClient = useQueryClient();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, watch, formState } = useForm<StructureSaveForm>({
    resolver: zodResolver(StructureSaveForm),
    defaultValues: {
      choice: canEstimate ? 'estimate' : 'entered', name: suggestedName, aliasesText: '', notes: '',
      energyUnit: 'kJ/mol', entropyUnit: 'J/(mol K)', provenanceKind: 'measured', provenanceText: '', overrideLibrary: overridesLibrary,
    } as StructureSaveForm,
  });
  const choice = watch('choice');
  const values = watch() as Record<string, unknown>;
  const fits = useQuery({ ...savedFitsQuery(), enabled: choice === 'fit' });
  const chosenFit = fits.data?.find((f) => f.id === Number(values.fitId));
  const fitTerms = chosenFit ? [...equationSpecies(chosenFit.equation).reactants, ...equationSpecies(chosenFit.equation).products] : [];
  const errors = formState.errors as Record<string, { message?: string } | undefined>;
  const reg = register as unknown as (name: string, opts?: object) => ReturnType<typeof register>;

  async function onSave(form: StructureSaveForm) {
    setFormError(null);
    try {
      const structure = 'smiles' in request ? { smiles: request.smiles } : { molfile: request.molfile };
      const saved = await createSpeciesFromStructure(toStructureRequest(StructureSaveForm.parse(form), structure, request.phase));
      // Routes evaluate through the team's species: their cached ladders and balance checks are out of date now.
      await Promise.all([queryClient.invalidateQueries({ queryKey: speciesKeys.all }), queryClient.invalidateQueries({ queryKey: routeKeys.all }), queryClient.invalidateQueries({ queryKey: ['balance'] })]);
      onSaved(saved);
    } catch (error) {
      const renamed = error instanceof Error && 'fields' in error && error.fields
        ? Object.assign(error, { fields: Object.fromEntries(Object.entries(error.fields as Record<string, string>).map(([k, v]) => [SERVER_FIELD[k] ?? k.replace(/^source\.values\./, ''), v])) })
        : error;
      setFormError(applyServerErrors(renamed, setError, KNOWN));
    }
  }

  const choices: Choice[] = canEstimate && !overridesLibrary ? ['estimate', 'entered', 'fit'] : ['entered', 'fit'];
  return (
    <form onSubmit={handleSubmit(onSave)} className="flex max-w-3xl flex-col gap-4" noValidate aria-label="Save as a team species">
      <h2 className="text-lg font-semibold text-ink">Save it for your team</h2>
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <fieldset className="grid gap-3 sm:grid-cols-3">
        <legend className="mb-1 text-sm font-semibold">Name</legend>
        <TextField
          label="Name"
          className="sm:col-span-2"
          hint="A name starting in lower case (or with a locant, 2-…) can be typed in equations as name(phase)."
          error={errors.name?.message}
          {...reg('name')}
        />
        <TextField label="Other names (comma-separated)" error={errors.aliasesText?.message} {...reg('aliasesText')} />
      </fieldset>
      <fieldset className="flex flex-col gap-1.5 text-sm">
        <legend className="mb-1 text-sm font-semibold">Values</legend>
        {choices.map((c) => (
          <label key={c} className="flex items-center gap-1.5">
            <input type="radio" value={c} {...reg('choice')} />
            {CHOICE_TEXT[c]}
          </label>
        ))}
      </fieldset>
      {choice === 'entered' ? (
        <EnteredValuesFields register={register} errors={formState.errors as never} energyUnit={String(values.energyUnit)} entropyUnit={String(values.entropyUnit)} kind={values.provenanceKind === 'citation' ? 'citation' : 'measured'} />
      ) : null}
      {choice === 'fit' ? (
        <fieldset className="grid gap-3 sm:grid-cols-2">
          <legend className="mb-1 text-sm font-semibold">Saved fit</legend>
          {fits.isPending ? <p className="text-sm text-ink-soft" role="status">Loading your team’s fits…</p> : null}
          {fits.isError ? <Notice tone="error">{fits.error.message}</Notice> : null}
          {fits.data && fits.data.length === 0 ? <p className="text-sm text-ink-soft sm:col-span-2">Your team has no saved fits yet. Fit a data set under Fits first.</p> : null}
          {fits.data && fits.data.length > 0 ? (
            <>
              <SelectField
                label="Fit"
                error={errors.fitId?.message}
                {...reg('fitId', toNumber)}
                options={[['', 'Choose a fit…'], ...fits.data.filter((f) => f.equation).map((f) => [String(f.id), `${f.name} — ${f.equation}`] as const)]}
              />
              <SelectField label="This structure is, in the fitted reaction" error={errors.fitSpecies?.message} {...reg('fitSpecies')} options={[['', 'Choose the species…'], ...fitTerms.map((t) => [t, t] as const)]} />
              <p className="text-xs text-ink-soft sm:col-span-2">ΔfH°, ΔfG° and S° are solved from the fit’s ΔrH° and ΔrS° and the library values of the reaction’s other species; the fit is recorded as the provenance.</p>
            </>
          ) : null}
        </fieldset>
      ) : null}
      <TextAreaField label="Notes (optional)" rows={2} error={errors.notes?.message} {...reg('notes')} />
      <div>
        <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Saving…' : 'Save as a team species'}</Button>
      </div>
    </form>
  );
}
