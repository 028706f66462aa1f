// Whether compared routes make the same target. Every figure is per mol of target, so routes with different
// targets are not like for like; the compare page and its report say so in words.

export interface TargetGroup {
  target: string;
  routeNames: string[];
}

// "CH3OH (l)" and "CH3OH(l)" are one target; case stays, since "Co" and "CO" are different species.
const sameKey = (target: string) => target.replace(/\s+/g, '');

/** The targets in first-seen order with the routes making each; null when every route makes the same one. */
export function differentTargets(routes: ReadonlyArray<{ name: string; target: string }>): TargetGroup[] | null {
  const groups = new Map<string, TargetGroup>();
  for (const route of routes) {
    const key = sameKey(route.target);
    const group = groups.get(key) ?? { target: route.target.trim(), routeNames: [] };
    group.routeNames.push(route.name);
    groups.set(key, group);
  }
  return groups.size > 1 ? [...groups.values()] : null;
}
