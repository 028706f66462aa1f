import 'server-only';
import { QueryTypes } from 'sequelize';
import { getDb } from '../../../db';
import { speciesReaderName } from '../../../components/chemistry/step-origin';
import { hasDrawing, type StepStructures, type StructureBrief } from '../../../components/chemistry/structure-brief';
import { BoundedMemo } from '../../thermo/bounded-memo';
import { isThermoError } from '../../thermo/errors';
import { resolveReaction } from '../../thermo/resolve-reaction';
import type { SpeciesLookup } from '../../thermo/species-library';
import { isStructureLookup, type SpeciesDefinition } from '../../thermo/structure/structure-lookup-type';

type Labels = Record<string, SpeciesDefinition>;

/** The species map of the team's latest step with each equation, so labels bound to a structure ("KR117-nitro") draw. */
export async function recentLabels({ teamId, equations }: { teamId: number; equations: readonly string[] }): Promise<Map<string, Labels>> {
  if (equations.length === 0) return new Map();
  const steps = await getDb().sequelize.query<{ equation: string; conditions: string | { species?: Labels } | null }>(
    `SELECT s.equation AS equation, s.conditions AS conditions
       FROM steps s JOIN routes r ON r.id = s.route_id
      WHERE r.team_id = :teamId AND r.deleted_at IS NULL AND s.equation IN (:equations)
      ORDER BY s.updated_at DESC, s.id DESC`,
    { replacements: { teamId, equations: [...equations] }, type: QueryTypes.SELECT },
  );
  const out = new Map<string, Labels>();
  for (const step of steps) {
    // SQLite hands JSON columns back as text in raw queries, PostgreSQL as objects.
    const conditions = typeof step.conditions === 'string' ? (JSON.parse(step.conditions) as { species?: Labels }) : step.conditions;
    const labels = conditions?.species;
    if (!out.has(step.equation) && labels && Object.keys(labels).length) out.set(step.equation, labels);
  }
  return out;
}

/** The structures of one equation read as the engine reads it, or null when it cannot be read or has nothing to draw. */
export function equationStructures(equation: string, lookup: SpeciesLookup, labels?: Labels): StepStructures | null {
  try {
    const stepLookup = labels && isStructureLookup(lookup) ? lookup.withLabels(labels) : lookup;
    const resolved = resolveReaction(equation, stepLookup);
    const out: StepStructures = { reactants: [], products: [] };
    for (const s of resolved.species) {
      const record = s.record;
      const brief: StructureBrief = {
        key: s.key, asWritten: s.asWritten, name: speciesReaderName({ key: s.key, as_written: s.asWritten, name: record.name, smiles: record.structure?.smiles ?? null }), formula: record.formula, smiles: record.structure?.smiles ?? null,
        origin: stepLookup.origin?.(s.key) ?? 'library',
      };
      (s.nu < 0 ? out.reactants : out.products).push(brief);
    }
    return hasDrawing(out) ? out : null;
  } catch (error) {
    // An equation the engine cannot read shows as text only; the board says what is wrong once it is dropped.
    if (isThermoError(error)) return null;
    throw error;
  }
}

// Per lookup object (a team's lookup is replaced whenever its species change), keyed by equation and labels, so
// typing in the palette's search never re-reads the same recent steps' SMILES.
const memoByLookup = new WeakMap<SpeciesLookup, BoundedMemo<string, StepStructures | null>>();

/** Equation → its structures, for each equation with at least one drawing. */
export function structuresByEquation(equations: readonly string[], lookup: SpeciesLookup, labels: ReadonlyMap<string, Labels> = new Map()): Record<string, StepStructures> {
  let memo = memoByLookup.get(lookup);
  if (!memo) memoByLookup.set(lookup, (memo = new BoundedMemo(500)));
  const out: Record<string, StepStructures> = {};
  for (const equation of new Set(equations)) {
    const stepLabels = labels.get(equation);
    const key = `${equation}\u0000${stepLabels ? JSON.stringify(stepLabels) : ''}`;
    let s = memo.get(key);
    if (s === undefined) {
      s = equationStructures(equation, lookup, stepLabels);
      memo.set(key, s);
    }
    if (s) out[equation] = s;
  }
  return out;
}
