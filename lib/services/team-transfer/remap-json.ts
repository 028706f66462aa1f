import { parseMentions } from './export-team';
import { refuseTeamFile } from './file-place';

type Cell = string | number | boolean | null;

// A function declaration, so the compiler narrows after a call as it does for `never`.
function invalid(where: string, message: string): never {
  return refuseTeamFile(where, message);
}

function parse(value: Cell, where: string): unknown {
  if (typeof value !== 'string') invalid(where, 'Expected JSON text.');
  try {
    return JSON.parse(value);
  } catch {
    return invalid(where, 'Not valid JSON.');
  }
}

function mapRouteId(id: unknown, routes: Map<number, number>, where: string): number {
  const mapped = typeof id === 'number' ? routes.get(id) : undefined;
  if (mapped === undefined) invalid(where, `Refers to route ${String(id)}, which is not in the file.`);
  return mapped;
}

// Ids kept inside JSON columns: the decision log's route lists and snapshot, and comment mentions.
export function remapJsonCell(
  table: string,
  column: string,
  value: Cell,
  where: string,
  maps: { routes: Map<number, number>; users: Map<number, number> },
): Cell {
  if (value === null) return null;
  if (table === 'decisions' && (column === 'route_ids' || column === 'shelved_route_ids')) {
    const ids = parse(value, where);
    if (!Array.isArray(ids)) invalid(where, 'Expected a list of route ids.');
    return JSON.stringify(ids.map((id, i) => mapRouteId(id, maps.routes, `${where}[${i}]`)));
  }
  if (table === 'decisions' && column === 'snapshot') {
    const snapshot = parse(value, where) as { routes?: { id?: unknown }[] } | null;
    if (!snapshot || typeof snapshot !== 'object') invalid(where, 'Expected the comparison snapshot.');
    if (Array.isArray(snapshot.routes)) {
      snapshot.routes = snapshot.routes.map((r, i) => ({ ...r, id: mapRouteId(r?.id, maps.routes, `${where}.routes[${i}].id`) }));
    }
    return JSON.stringify(snapshot);
  }
  if (table === 'comments' && column === 'mentions') {
    // A mentioned person without an account here is dropped from the list; the text keeps the @handle.
    const mentions = parseMentions(value).flatMap((m) => {
      const userId = maps.users.get(m.userId);
      return userId === undefined ? [] : [{ ...m, userId }];
    });
    return JSON.stringify(mentions);
  }
  return value;
}
