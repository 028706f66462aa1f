import { env } from '../../env';

/** The in-app path to a route, opened at one step when there is one. */
export function routeStepPath(routeId: number, stepKey: string | null): string {
  return stepKey ? `/routes/${routeId}?step=${encodeURIComponent(stepKey)}` : `/routes/${routeId}`;
}

/** The same place as an absolute address for e-mail: `<app url>/routes/<routeId>?step=<stepKey>`. */
export function absoluteLink(path: string): string {
  return new URL(path, env().APP_URL).toString();
}
