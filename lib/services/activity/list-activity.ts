import 'server-only';
import { encodeActivityCursor, type ActivityPageDto, type ListActivityQuery } from '../../schemas/activity';
import { userNames } from '../comments/comment-context';
import { findRouteRow } from '../routes/get-route';
import { ACTIVITY_SOURCES } from './activity-sources';
import { mergeActivity, positionOf } from './merge-activity';

// One newest-first feed of a route's saves, moves, comments, thread resolutions and flags, keyset-paged.
export async function listActivity({ teamId, routeId, query }: { teamId: number; routeId: number; query: ListActivityQuery }): Promise<ActivityPageDto> {
  await findRouteRow({ teamId, routeId });
  const options = { teamId, routeId, before: query.before, take: query.limit + 1 };
  const sources = await Promise.all(ACTIVITY_SOURCES.map((source) => source(options)));
  const { page, last, hasMore } = mergeActivity(sources.map((s) => s.entries), { before: query.before, limit: query.limit });

  const people = new Map(sources.flatMap((s) => [...s.people]));
  const names = await userNames(page.flatMap((e) => [people.get(e)?.actorId, ...(people.get(e)?.reviewerIds ?? [])]));
  const person = (id: number | null | undefined) => (typeof id === 'number' && names.has(id) ? { id, name: names.get(id)! } : null);
  const items = page.map((entry) => {
    const who = people.get(entry);
    const item = { ...entry.item, actor: person(who?.actorId) };
    if (item.kind === 'transition') item.reviewers = (who?.reviewerIds ?? []).map((id) => person(id) ?? { id, name: '—' });
    return item;
  });
  return { items, nextBefore: hasMore && last ? encodeActivityCursor(positionOf(last)) : null };
}
