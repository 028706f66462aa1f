// Small routes shared by the route tests; reactions and species are all in the built-in library.
import type { RouteEvaluateRequest, RouteStep } from '@/lib/thermo/route';

export const NH3_SYNTHESIS = 'N2(g) + 3 H2(g) -> 2 NH3(g)';
export const HCL_SYNTHESIS = 'H2(g) + Cl2(g) -> 2 HCl(g)';
export const NH4CL_FORMATION = 'NH3(g) + HCl(g) -> NH4Cl(s)';

/** Two branches (ammonia, hydrogen chloride) feeding one step (ammonium chloride). */
export function ammoniumChlorideTree(order: ('nh3' | 'hcl' | 'salt')[] = ['salt', 'nh3', 'hcl']): RouteEvaluateRequest {
  const steps: Record<string, RouteStep> = {
    nh3: { id: 'nh3', equation: NH3_SYNTHESIS },
    hcl: { id: 'hcl', equation: HCL_SYNTHESIS },
    salt: { id: 'salt', equation: NH4CL_FORMATION },
  };
  return {
    target: 'NH4Cl(s)',
    steps: order.map((k) => steps[k]!),
    links: [
      { from: 'nh3', to: 'salt', species: 'NH3(g)' },
      { from: 'hcl', to: 'salt', species: 'HCl(g)' },
    ],
  };
}

/** A plain chain s1 → s2 → … where each link carries the named species. */
export function chain(target: string, equations: string[], carried: string[], extra: Partial<RouteStep>[] = []): RouteEvaluateRequest {
  return {
    target,
    steps: equations.map((equation, i) => ({ id: `s${i + 1}`, equation, ...(extra[i] ?? {}) })),
    links: carried.map((species, i) => ({ from: `s${i + 1}`, to: `s${i + 2}`, species })),
  };
}
