import { errorBody } from './errors';

// The methods a route file may serve; each file exports every one of them, served or refused.
export const API_METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;
export type ApiMethod = (typeof API_METHODS)[number];

type Handler = (req: Request) => Response;
const REFUSED = Symbol.for('stepwell.refusedMethod');

/** Whether a route export is one of refuseOtherMethods' answers rather than a handler of its own. */
export function isRefusedMethod(handler: unknown): boolean {
  return typeof handler === 'function' && (handler as unknown as Record<symbol, unknown>)[REFUSED] === true;
}

function allowHeader(served: readonly string[]): string {
  const allow = new Set([...served, 'OPTIONS']);
  if (allow.has('GET')) allow.add('HEAD'); // Next answers HEAD with the GET handler
  return [...allow].sort().join(', ');
}

/**
 * Handlers for the methods a route file does not serve, plus OPTIONS. Without them Next answers an unknown method
 * with an empty 405 and no Allow header, and would list these exports as served in its own OPTIONS answer.
 * Use: `export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });`
 */
export function refuseOtherMethods<T extends Partial<Record<ApiMethod, unknown>>>(served: T): Record<Exclude<ApiMethod, keyof T> | 'OPTIONS', Handler> {
  const allow = allowHeader(API_METHODS.filter((m) => typeof served[m] === 'function' && !isRefusedMethod(served[m])));
  const refuse: Handler = (req) =>
    Response.json(errorBody('METHOD_NOT_ALLOWED', `This address does not take ${req.method}; it takes ${allow}.`), { status: 405, headers: { Allow: allow } });
  Object.defineProperty(refuse, REFUSED, { value: true });
  const options: Handler = () => new Response(null, { status: 204, headers: { Allow: allow } });
  const answers = Object.fromEntries(API_METHODS.filter((m) => !(m in served)).map((m) => [m, refuse]));
  return { ...answers, OPTIONS: options } as Record<Exclude<ApiMethod, keyof T> | 'OPTIONS', Handler>;
}
