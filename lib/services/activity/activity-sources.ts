import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { getDb } from '../../../db';
import type { ActivityPosition } from '../../schemas/activity';
import type { RouteStatus } from '../../schemas/workflow';
import { KIND_RANK, windowFor, type ActivityEntry, type SourceWindow } from './merge-activity';
import { readableSummaries } from '../revisions/relabel-summaries';
import { plainExcerpt } from './plain-excerpt';

/** One source's newest rows past the position; actors (and reviewers) are named afterwards by id. */
export interface SourceRows {
  entries: ActivityEntry[];
  /** user ids to name, by entry (same order): the actor, then any reviewers */
  people: Map<ActivityEntry, { actorId: number | null; reviewerIds?: number[] }>;
}

export interface SourceOptions {
  teamId: number;
  routeId: number;
  before?: ActivityPosition;
  /** how many rows to take: the page size plus one */
  take: number;
}

// The keyset condition on one time column (and the row id for ties), as a list to AND with the rest.
function timeConditions(column: string, window: SourceWindow | null): WhereOptions[] {
  if (!window) return [];
  if (window.mode === 'atOrBefore') return [{ [column]: { [Op.lte]: window.at } }];
  if (window.mode === 'before') return [{ [column]: { [Op.lt]: window.at } }];
  return [{ [Op.or]: [{ [column]: { [Op.lt]: window.at } }, { [column]: window.at, id: { [Op.lt]: window.seq } }] }];
}

const newestBy = (column: string): [string, string][] => [[column, 'DESC'], ['id', 'DESC']];

function collect(): SourceRows {
  return { entries: [], people: new Map() };
}

export async function revisionRows({ teamId, routeId, before, take }: SourceOptions): Promise<SourceRows> {
  const rows = await getDb().models.RouteRevision.findAll({
    where: { [Op.and]: [{ routeId, teamId }, ...timeConditions('createdAt', windowFor(KIND_RANK.revision, before))] },
    attributes: ['id', 'version', 'authorId', 'summary', 'restoredFromId', 'createdAt'],
    order: newestBy('createdAt'),
    limit: take,
  });
  const out = collect();
  // Older summaries named steps by id; they read with labels from their own revision's document.
  const summaries = await readableSummaries(rows);
  for (const r of rows) {
    const summary = summaries.get(r.id) ?? r.summary;
    const entry: ActivityEntry = {
      at: r.createdAt.getTime(),
      seq: r.id,
      item: {
        kind: 'revision', id: `revision:${r.id}`, at: r.createdAt.toISOString(), actor: null, stepKey: null, text: summary,
        revisionId: r.id, version: r.version, summary, restoredFromId: r.restoredFromId ?? null,
      },
    };
    out.entries.push(entry);
    out.people.set(entry, { actorId: r.authorId });
  }
  return out;
}

export async function transitionRows({ teamId, routeId, before, take }: SourceOptions): Promise<SourceRows> {
  const { RouteTransition, RouteReviewer } = getDb().models;
  const rows = await RouteTransition.findAll({
    where: { [Op.and]: [{ routeId, teamId }, ...timeConditions('createdAt', windowFor(KIND_RANK.transition, before))] },
    order: newestBy('createdAt'),
    limit: take,
  });
  const reviewers = rows.length
    ? await RouteReviewer.findAll({ where: { transitionId: { [Op.in]: rows.map((r) => r.id) } }, attributes: ['transitionId', 'userId'], order: [['userId', 'ASC']] })
    : [];
  const out = collect();
  for (const r of rows) {
    const entry: ActivityEntry = {
      at: r.createdAt.getTime(),
      seq: r.id,
      item: {
        kind: 'transition', id: `transition:${r.id}`, at: r.createdAt.toISOString(), actor: null, stepKey: null, text: r.note,
        transitionId: r.id, from: r.fromStatus as RouteStatus, to: r.toStatus as RouteStatus, note: r.note, reviewers: [],
      },
    };
    out.entries.push(entry);
    out.people.set(entry, { actorId: r.actorId, reviewerIds: reviewers.filter((v) => v.transitionId === r.id).map((v) => v.userId) });
  }
  return out;
}

export async function commentRows({ teamId, routeId, before, take }: SourceOptions): Promise<SourceRows> {
  const rows = await getDb().models.Comment.findAll({
    where: { [Op.and]: [{ routeId, teamId }, ...timeConditions('createdAt', windowFor(KIND_RANK.comment, before))] },
    attributes: ['id', 'stepKey', 'parentId', 'authorId', 'body', 'editedAt', 'deletedAt', 'createdAt'],
    order: newestBy('createdAt'),
    limit: take,
  });
  const out = collect();
  for (const c of rows) {
    const isDeleted = c.deletedAt != null;
    const entry: ActivityEntry = {
      at: c.createdAt.getTime(),
      seq: c.id,
      item: {
        kind: 'comment', id: `comment:${c.id}`, at: c.createdAt.toISOString(), actor: null, stepKey: c.stepKey, text: isDeleted ? '' : plainExcerpt(c.body),
        commentId: c.id, threadId: c.parentId ?? c.id, isReply: c.parentId !== null, isEdited: c.editedAt != null, isDeleted,
      },
    };
    out.entries.push(entry);
    out.people.set(entry, { actorId: c.authorId });
  }
  return out;
}

// Resolving and reopening leave no row of their own beyond the audit trail, which is where their history is read from.
export async function threadRows({ teamId, routeId, before, take }: SourceOptions): Promise<SourceRows> {
  const { AuditEvent, Comment } = getDb().models;
  const out = collect();
  const roots = await Comment.findAll({ where: { routeId, teamId, parentId: null }, attributes: ['id', 'stepKey', 'body', 'deletedAt'] });
  if (roots.length === 0) return out;
  const byId = new Map(roots.map((r) => [String(r.id), r]));
  const rows = await AuditEvent.findAll({
    where: {
      [Op.and]: [
        { teamId, action: { [Op.in]: ['comment.resolved', 'comment.reopened'] }, targetType: 'comment', targetId: { [Op.in]: [...byId.keys()] } },
        ...timeConditions('createdAt', windowFor(KIND_RANK.thread_resolved, before)),
      ],
    },
    attributes: ['id', 'actorId', 'action', 'targetId', 'createdAt'],
    order: newestBy('createdAt'),
    limit: take,
  });
  for (const e of rows) {
    const root = byId.get(e.targetId!)!;
    const entry: ActivityEntry = {
      at: e.createdAt.getTime(),
      seq: e.id,
      item: {
        kind: e.action === 'comment.resolved' ? 'thread_resolved' : 'thread_reopened', id: `thread:${e.id}`, at: e.createdAt.toISOString(), actor: null,
        stepKey: root.stepKey, text: root.deletedAt ? '' : plainExcerpt(root.body), threadId: root.id,
      },
    };
    out.entries.push(entry);
    out.people.set(entry, { actorId: e.actorId });
  }
  return out;
}

export async function flagRaisedRows({ teamId, routeId, before, take }: SourceOptions): Promise<SourceRows> {
  const rows = await getDb().models.StepFlag.findAll({
    where: { [Op.and]: [{ routeId, teamId }, ...timeConditions('createdAt', windowFor(KIND_RANK.flag_raised, before))] },
    order: newestBy('createdAt'),
    limit: take,
  });
  const out = collect();
  for (const f of rows) {
    const entry: ActivityEntry = {
      at: f.createdAt.getTime(),
      seq: f.id,
      item: {
        kind: 'flag_raised', id: `flag_raised:${f.id}`, at: f.createdAt.toISOString(), actor: null, stepKey: f.stepKey, text: f.reason,
        flagId: f.id, category: f.category, reason: f.reason, clearCommentId: null,
      },
    };
    out.entries.push(entry);
    out.people.set(entry, { actorId: f.createdById });
  }
  return out;
}

export async function flagClearedRows({ teamId, routeId, before, take }: SourceOptions): Promise<SourceRows> {
  const rows = await getDb().models.StepFlag.findAll({
    where: { [Op.and]: [{ routeId, teamId, clearedAt: { [Op.ne]: null } }, ...timeConditions('clearedAt', windowFor(KIND_RANK.flag_cleared, before))] },
    order: newestBy('clearedAt'),
    limit: take,
  });
  const out = collect();
  for (const f of rows) {
    const at = f.clearedAt!;
    const entry: ActivityEntry = {
      at: at.getTime(),
      seq: f.id,
      item: {
        kind: 'flag_cleared', id: `flag_cleared:${f.id}`, at: at.toISOString(), actor: null, stepKey: f.stepKey, text: f.reason,
        flagId: f.id, category: f.category, reason: f.reason, clearCommentId: f.clearCommentId ?? null,
      },
    };
    out.entries.push(entry);
    out.people.set(entry, { actorId: f.clearedById ?? null });
  }
  return out;
}

export const ACTIVITY_SOURCES = [revisionRows, transitionRows, commentRows, threadRows, flagRaisedRows, flagClearedRows];
