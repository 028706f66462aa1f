import 'server-only';
import { QueryTypes, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import type { StepConditions } from '../../../db/models/step';
import type { LinkInput, StepInput } from '../../schemas/route';

interface StepRowRaw {
  step_key: string;
  equation: string;
  conditions: string | StepConditions;
  yield_pct: number;
  notes: string;
  position_x: number;
  position_y: number;
}

// Plain SQL, not model instances: a 200-step route is read on every evaluation of the saved route.
export async function readStepInputs(routeId: number, transaction?: Transaction): Promise<StepInput[]> {
  const rows = await getDb().sequelize.query<StepRowRaw>(
    'SELECT step_key, equation, conditions, yield_pct, notes, position_x, position_y FROM steps WHERE route_id = :routeId ORDER BY sort_order ASC',
    { replacements: { routeId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({
    id: r.step_key,
    equation: r.equation,
    // SQLite hands JSON back as text; other dialects parse it.
    ...(typeof r.conditions === 'string' ? (JSON.parse(r.conditions) as StepConditions) : r.conditions),
    yieldPct: r.yield_pct,
    notes: r.notes,
    position: { x: r.position_x, y: r.position_y },
  }));
}

export async function readLinkInputs(routeId: number, transaction?: Transaction): Promise<LinkInput[]> {
  const rows = await getDb().sequelize.query<{ from_key: string; to_key: string; species: string }>(
    'SELECT from_key, to_key, species FROM step_links WHERE route_id = :routeId ORDER BY id ASC',
    { replacements: { routeId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({ from: r.from_key, to: r.to_key, species: r.species }));
}
