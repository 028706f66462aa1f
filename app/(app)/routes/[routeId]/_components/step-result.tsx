import { ClassBadge } from '@/components/ladder/class-badge';
import { formatEnergy, formatNumber, formatTemperature, type EnergyUnit, type TemperatureUnit } from '@/components/ladder/energy-format';
import { CAUSE_LABEL, causeOf, messageAtField } from '@/lib/route-editor/step-errors';
import type { EvaluateResponse } from '@/lib/thermo';
import type { StepInput } from '@/lib/schemas/route';
import type { RouteStepResult } from '@/lib/thermo/route';
import { NewSpeciesForError, StepSpecies } from './step-species';
import { estimateSentence, SIGN_UNCERTAIN_SENTENCE, speciesLabel, withSpeciesNames } from './step-species-notes';

/** Where the step's ΔH° and ΔS° came from: a saved fit, the team's own species, the built-in library, estimates. */
export function dataSourceText(engine: EvaluateResponse): string {
  if (engine.override) return engine.override.source;
  const team = engine.species.filter((s) => s.origin === 'team');
  const estimates = engine.species.some((s) => s.origin === 'estimated') ? ' and estimates from structure' : '';
  if (team.length === 0) return `the species library${estimates}`;
  const names = team.map((s) => `${speciesLabel(s)}${s.override ? ', overriding the library,' : ''} (${s.source})`).join('; ');
  return `team species ${names}; the rest from the library${estimates}`;
}

function Fact({ term, value }: { term: string; value: string }) {
  return (
    <div className="flex justify-between gap-2">
      <dt className="text-ink-soft">{term}</dt>
      <dd className="tabular-nums text-ink">{value}</dd>
    </div>
  );
}

// The engine's figures for the selected step; its notes and remedies are in the remedies panel below. A step edited
// since its figures were computed shows none of them: old figures must not read as the edited step's.
export function StepResult({
  result,
  isStale = false,
  energyUnit,
  temperatureUnit,
  stepSpecies,
}: {
  result: RouteStepResult | undefined;
  isStale?: boolean;
  /** the step's labels, so a "not in the library" link can carry the structure typed */
  stepSpecies?: StepInput['species'];
  energyUnit: EnergyUnit;
  temperatureUnit: TemperatureUnit;
}) {
  if (isStale) {
    return (
      <p className="text-xs text-ink-faint" aria-live="polite" data-testid="step-result-stale">
        Changed: evaluating the edited step…
      </p>
    );
  }
  if (!result) return <p className="text-xs text-ink-faint">Evaluating…</p>;
  const engine = result.result;
  const estimates = engine ? estimateSentence(engine, energyUnit) : null;
  return (
    <section aria-label="Evaluation of this step" className="flex flex-col gap-1.5 text-xs" data-testid="step-result">
      <div>
        <ClassBadge cls={result.class} isSignUncertain={result.signUncertain} />
      </div>
      {result.error ? (
        // The cause in a word, then the engine's message; the field that caused it says it too.
        <p className="text-uphill" data-testid="step-result-error">
          <span className="font-semibold">{CAUSE_LABEL[causeOf(result.error)]}:</span> {messageAtField(result.error)}
        </p>
      ) : null}
      <NewSpeciesForError error={result.error} species={stepSpecies} />
      {engine ? (
        <dl className="flex flex-col gap-0.5">
          <Fact
            term={engine.deltaG_kJ === null ? 'ΔG (standard state)' : 'ΔG at conditions'}
            value={formatEnergy(engine.deltaG_kJ ?? engine.deltaG0_kJ, energyUnit, { perMol: true })}
          />
          <Fact term={`ΔG° at ${formatTemperature(engine.temperature_K, temperatureUnit)}`} value={formatEnergy(engine.deltaG0_kJ, energyUnit, { perMol: true })} />
          <Fact term="ΔH°" value={formatEnergy(engine.deltaH0_kJ, energyUnit, { perMol: true })} />
          <Fact term="K" value={formatNumber(engine.K)} />
          <Fact term="ΔG° changes sign at" value={formatTemperature(engine.crossover_K, temperatureUnit)} />
          <Fact term="Extent for the target" value={result.extent_mol === null ? 'not on the path' : `${formatNumber(result.extent_mol)} mol`} />
          <Fact term="Share of route ΔG" value={formatEnergy(result.deltaG_kJ, energyUnit)} />
        </dl>
      ) : null}
      {engine ? (
        <p className="text-ink-soft" data-testid="step-data-source">
          ΔH° and ΔS° from {dataSourceText(engine)}.
        </p>
      ) : null}
      {engine && estimates ? <p className="text-ink-soft" data-testid="step-estimates">{estimates}</p> : null}
      {result.signUncertain ? <p className="text-brass-700">{SIGN_UNCERTAIN_SENTENCE}</p> : null}
      {engine ? <StepSpecies species={engine.species} energyUnit={energyUnit} /> : null}
      {engine?.warnings.length ? (
        <ul className="list-disc pl-4 text-marginal" aria-label="Engine notes on this step">
          {engine.warnings.map((w, i) => (
            <li key={`${w.code}-${i}`}>{withSpeciesNames(w.message, engine.species)}</li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
