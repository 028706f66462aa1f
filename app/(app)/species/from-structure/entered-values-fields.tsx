'use client';

// The values a team measured or found in print, with their units and where they come from (required).
import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { TextField } from '@/components/ui/text-field';
import type { StructureSaveForm } from '@/lib/schemas/species-structure';
import { ENERGY_UNITS, ENTROPY_UNITS } from '@/lib/species/units';
import { SelectField } from '../_components/select-field';

export const toNumber = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? null : typeof v === 'number' ? v : Number(String(v).replace('−', '-'))) };

type Errors = FieldErrors<Extract<StructureSaveForm, { choice: 'entered' }>>;

export function EnteredValuesFields({ register, errors, energyUnit, entropyUnit, kind }: {
  register: UseFormRegister<StructureSaveForm>; errors: Errors; energyUnit: string; entropyUnit: string; kind: 'citation' | 'measured';
}) {
  const e = (name: keyof Errors) => errors[name]?.message as string | undefined;
  // The union's branches share the form; register is typed for the whole union.
  const reg = register as unknown as UseFormRegister<Record<string, unknown>>;
  return (
    <>
      <fieldset className="grid gap-3 sm:grid-cols-3">
        <legend className="mb-1 text-sm font-semibold">Values at 298.15 K and 1 bar</legend>
        <SelectField label="Energy unit" {...reg('energyUnit')} options={ENERGY_UNITS.map((u) => [u, u])} />
        <SelectField label="Entropy and Cp° unit" {...reg('entropyUnit')} options={ENTROPY_UNITS.map((u) => [u, u])} />
        <span />
        <TextField label={`ΔfH° (${energyUnit})`} inputMode="decimal" error={e('dfH')} {...reg('dfH', toNumber)} />
        <TextField label={`ΔfG° (${energyUnit})`} inputMode="decimal" hint="Leave blank to derive it from ΔfH° and S°." error={e('dfG')} {...reg('dfG', toNumber)} />
        <TextField label={`S° (${entropyUnit})`} inputMode="decimal" error={e('S')} {...reg('S', toNumber)} />
        <TextField label={`σ(ΔfH°) (${energyUnit})`} inputMode="decimal" hint="Optional." error={e('sigmaDfH')} {...reg('sigmaDfH', toNumber)} />
        <TextField label={`σ(ΔfG°) (${energyUnit})`} inputMode="decimal" hint="Optional." error={e('sigmaDfG')} {...reg('sigmaDfG', toNumber)} />
        <TextField label={`σ(S°) (${entropyUnit})`} inputMode="decimal" hint="Optional." error={e('sigmaS')} {...reg('sigmaS', toNumber)} />
        <TextField label={`Cp° (${entropyUnit})`} inputMode="decimal" hint="Optional; taken as constant." error={e('Cp')} {...reg('Cp', toNumber)} />
        <TextField label="Cp° good from (K)" inputMode="decimal" hint="Blank: 298.15 ± 100 K." error={e('cpTmin_K')} {...reg('cpTmin_K', toNumber)} />
        <TextField label="Cp° good to (K)" inputMode="decimal" error={e('cpTmax_K')} {...reg('cpTmax_K', toNumber)} />
      </fieldset>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-semibold">Where the values come from</legend>
        <div className="flex flex-wrap gap-4 text-sm" role="radiogroup" aria-label="Kind of source">
          <label className="flex items-center gap-1.5"><input type="radio" value="measured" {...reg('provenanceKind')} /> Measured by us</label>
          <label className="flex items-center gap-1.5"><input type="radio" value="citation" {...reg('provenanceKind')} /> From a publication</label>
        </div>
        <TextField
          label={kind === 'citation' ? 'Citation' : 'Data set or notebook reference'}
          hint={kind === 'citation' ? 'Authors, title, journal, year, table or page.' : 'Where the raw data are: a data set, a notebook page.'}
          error={e('provenanceText')}
          {...reg('provenanceText')}
        />
      </fieldset>
    </>
  );
}
