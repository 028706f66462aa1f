// The species of the selected step: drawing (when known by structure), name, formula, where each value came from and
// its σ(ΔfG°). Drawings are images from the server, so no chemistry code joins the editor's bundle.
import { FormulaText } from '@/components/chemistry/formula-text';
import { OriginMark } from '@/components/chemistry/origin-mark';
import { StructureImage } from '@/components/chemistry/structure-image';
import { energyFromKJ, energyUnitLabel, type EnergyUnit } from '@/components/ladder/energy-format';
import type { SpeciesProvenance } from '@/lib/thermo';
import type { SpeciesDefinition } from '@/lib/thermo/structure/structure-lookup-type';
import { NewSpeciesLink } from '../../../species/_components/new-species-link';
import { missingSpeciesSeed, speciesLabel } from './step-species-notes';

const DRAWING = { width: 48, height: 36 };

function sigmaText(sigma_kJ: number | null, unit: EnergyUnit): string {
  if (sigma_kJ === null || !Number.isFinite(sigma_kJ)) return 'σ unknown';
  return `σ ${energyFromKJ(sigma_kJ, unit).toFixed(1)} ${energyUnitLabel(unit)}/mol`;
}

function SpeciesRow({ s, energyUnit }: { s: SpeciesProvenance; energyUnit: EnergyUnit }) {
  return (
    <li className="flex items-center gap-2 py-1" data-testid="step-species-row">
      {s.smiles ? (
        <StructureImage smiles={s.smiles} name={s.name} formula={s.formula} {...DRAWING} className="rounded bg-white/70" />
      ) : (
        <span aria-hidden="true" className="shrink-0" style={DRAWING} />
      )}
      <div className="min-w-0 flex-1">
        <p className="truncate font-medium text-ink" title={s.name}>{s.name || speciesLabel(s)}</p>
        <p className="text-ink-soft">
          <FormulaText value={s.key} name={null} formula={s.formula} />
          <span className="text-ink-faint"> · {s.nu < 0 ? 'consumed' : 'made'}</span>
        </p>
      </div>
      <div className="flex shrink-0 flex-col items-end gap-0.5">
        <OriginMark facts={{ origin: s.origin, source: s.source, method: s.method ?? null, sigma_kJ: s.sigma_dfG_kJ }} />
        <span className="tabular-nums text-[11px] text-ink-faint">{sigmaText(s.sigma_dfG_kJ, energyUnit)}</span>
      </div>
    </li>
  );
}

export function StepSpecies({ species, energyUnit }: { species: readonly SpeciesProvenance[]; energyUnit: EnergyUnit }) {
  if (species.length === 0) return null;
  return (
    <section aria-label="Species in this step" className="flex flex-col">
      <h3 className="text-xs font-semibold text-ink">Species</h3>
      <ul className="divide-y divide-paper-edge">
        {species.map((s) => (
          <SpeciesRow key={s.key} s={s} energyUnit={energyUnit} />
        ))}
      </ul>
    </section>
  );
}

/** Under a "not in the library" (or "no estimate") error: the way to make the species, carrying what was typed. */
export function NewSpeciesForError({ error, species }: { error: { code: string; message: string; field?: string | null } | null | undefined; species?: Readonly<Record<string, SpeciesDefinition>> }) {
  const seed = missingSpeciesSeed(error, species);
  if (!seed) return null;
  return (
    <p className="text-xs">
      <NewSpeciesLink smiles={seed.smiles} name={seed.name} phase={seed.phase}>
        {seed.noEstimate ? 'Enter measured or published values for it' : 'Not in the library? New species from a structure'}
      </NewSpeciesLink>
    </p>
  );
}
