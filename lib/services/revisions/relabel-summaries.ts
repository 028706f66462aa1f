import 'server-only';
import { Op } from 'sequelize';
import { getDb } from '../../../db';
import type { RouteSnapshot } from './revision-snapshot';
import { mayNameStepIds, readableSummary } from './revision-labels';

/**
 * Readable summaries for revision rows read without their snapshots (lists, the activity feed): only rows whose
 * summary may hold step ids have their snapshot read, in one query.
 */
export async function readableSummaries(rows: readonly { id: number; summary: string }[]): Promise<Map<number, string>> {
  const out = new Map(rows.map((r) => [r.id, r.summary]));
  const old = rows.filter((r) => mayNameStepIds(r.summary)).map((r) => r.id);
  if (old.length === 0) return out;
  const full = await getDb().models.RouteRevision.findAll({ where: { id: { [Op.in]: old } }, attributes: ['id', 'summary', 'snapshot'] });
  for (const row of full) {
    try {
      out.set(row.id, readableSummary(row.summary, JSON.parse(row.snapshot) as RouteSnapshot));
    } catch {
      // An unreadable snapshot leaves the summary as stored.
    }
  }
  return out;
}
