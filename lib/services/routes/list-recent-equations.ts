import 'server-only';
import { QueryTypes } from 'sequelize';
import { getDb } from '../../../db';

// The team's most recently edited distinct equations, for the palette.
export async function listRecentEquations({ teamId, limit = 12 }: { teamId: number; limit?: number }): Promise<string[]> {
  const rows = await getDb().sequelize.query<{ equation: string }>(
    `SELECT s.equation AS equation, MAX(s.updated_at) AS last_used
       FROM steps s JOIN routes r ON r.id = s.route_id
      WHERE r.team_id = :teamId AND r.deleted_at IS NULL AND s.equation <> ''
      GROUP BY s.equation ORDER BY last_used DESC LIMIT :limit`,
    { replacements: { teamId, limit }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.equation);
}
