import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import type { RouteDocumentDto } from '../routes/route-dto';
import type { SpeciesLookup } from '../../thermo/species-library';
import { evaluateRouteDocument, type RouteEvaluation } from '../routes/evaluate-route-document';
import { toRevisionState, toRevisionSummary, type RevisionSummaryDto } from './revision-dto';
import { energiesOf, toSnapshot, type RevisionState } from './revision-snapshot';
import { diffRevisions, isLayoutOnly } from './revision-diff';
import { summariseRevision } from './revision-summary';

/** The route's newest revision, or null for a route that has none (rows written before revisions, e.g. seeds). */
export async function latestRevisionState({ routeId, transaction }: { routeId: number; transaction: Transaction }): Promise<RevisionState | null> {
  const row = await getDb().models.RouteRevision.findOne({ where: { routeId }, order: [['version', 'DESC']], transaction });
  return row ? toRevisionState(row) : null;
}

// A route without revisions is compared against its saved rows, evaluated once for their ΔG.
export function stateOfDocument(doc: RouteDocumentDto, evaluation: RouteEvaluation | undefined, lookup: SpeciesLookup): RevisionState {
  const snapshot = toSnapshot(doc);
  return { snapshot, ...energiesOf(evaluation ?? (doc.steps.length ? evaluateRouteDocument(snapshot, lookup) : null)) };
}

/**
 * Writes the revision for a document just saved at `doc.version`, in the save's transaction. A save that only moved
 * nodes writes none (null): the positions are saved with the route and ride along in the next real revision, whose
 * diff against the last one counts the moves.
 */
export async function recordRevision({
  doc,
  teamId,
  userId,
  evaluation,
  energies,
  previous,
  head,
  restoredFromId = null,
  transaction,
}: {
  doc: RouteDocumentDto;
  teamId: number;
  userId: number;
  evaluation: RouteEvaluation | null;
  /** known energies of this exact document (a copy's are its source's), instead of `evaluation` */
  energies?: Pick<RevisionState, 'stepDeltaG' | 'overallDeltaG_kJ'>;
  previous: RevisionState | null;
  head?: string;
  restoredFromId?: number | null;
  transaction: Transaction;
}): Promise<RevisionSummaryDto | null> {
  const next: RevisionState = { snapshot: toSnapshot(doc), ...(energies ?? energiesOf(evaluation)) };
  if (previous && !head && !restoredFromId && isLayoutOnly(diffRevisions(previous, next))) return null;
  const row = await getDb().models.RouteRevision.create(
    {
      routeId: doc.id,
      teamId,
      version: doc.version,
      authorId: userId,
      summary: summariseRevision(previous, next, head),
      snapshot: JSON.stringify(next.snapshot),
      stepDg: next.stepDeltaG,
      overallDgKj: next.overallDeltaG_kJ,
      restoredFromId,
    },
    { transaction },
  );
  const author = await getDb().models.User.findByPk(userId, { attributes: ['name'], transaction });
  return toRevisionSummary(row, author?.name);
}
