import 'server-only';
import { NextResponse, type NextRequest } from 'next/server';
import { type z } from 'zod';
import { can, type Permission } from '../auth/permissions';
import { sessionUserFromRequest, type SessionUser } from '../auth/session-user';
import { installPeerAddressHook } from '../security/peer-address';
import { findActiveMembership, findMembership, type TeamContext } from '../services/teams/find-membership';
import { AppError } from './errors';
import { checkOrigin } from './origin';
import { DEFAULT_MAX_BODY_BYTES, readJsonBody } from './read-body';
import { toErrorResponse, zodFields } from './error-response';
import { refuseNulInUrl } from './url-text';

type Access = 'public' | 'user' | 'team';

interface RouteOptions<B extends z.ZodType | undefined, Q extends z.ZodType | undefined, A extends Access> {
  access: A;
  permission?: Permission;
  /** Where the team comes from: the `teamId` path segment, the user's active team, or the team owning a resource. */
  teamFrom?: TeamSource;
  body?: B;
  query?: Q;
  maxBodyBytes?: number;
}

export interface RouteContext<B, Q, A extends Access> {
  req: NextRequest;
  params: Record<string, string>;
  body: B extends z.ZodType ? z.infer<B> : undefined;
  query: Q extends z.ZodType ? z.infer<Q> : undefined;
  user: A extends 'public' ? SessionUser | null : SessionUser;
  team: A extends 'team' ? TeamContext : null;
}

/** Finds the team that owns the resource named in the path, or null when there is none. */
export type TeamOfResource = (params: Record<string, string>) => Promise<number | null>;
type TeamSource = 'path' | 'active' | TeamOfResource;

type NextContext = { params: Promise<Record<string, string | string[]>> };

const MUTATING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

// On with the first API request a process serves (often a health check), so rate limits see socket addresses early.
installPeerAddressHook();

export function withRoute<B extends z.ZodType | undefined = undefined, Q extends z.ZodType | undefined = undefined, A extends Access = Access>(
  options: RouteOptions<B, Q, A>,
  handler: (ctx: RouteContext<B, Q, A>) => Promise<unknown>,
) {
  return async function route(req: NextRequest, next?: NextContext): Promise<Response> {
    try {
      if (MUTATING.has(req.method)) checkOrigin(req);
      const params = flattenParams((await next?.params) ?? {});
      refuseNulInUrl(params, req.nextUrl.searchParams);
      const user = options.access === 'public' ? await optionalUser(req) : await requireUser(req);
      const team = options.access === 'team' ? await resolveTeam(user as SessionUser, params, options) : null;
      const query = options.query ? parseWith(options.query, Object.fromEntries(req.nextUrl.searchParams)) : undefined;
      const body = options.body
        ? parseWith(options.body, await readJsonBody(req, options.maxBodyBytes ?? DEFAULT_MAX_BODY_BYTES))
        : undefined;
      const ctx = { req, params, body, query, user, team } as RouteContext<B, Q, A>;
      const result = await handler(ctx);
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (error) {
      return toErrorResponse(error);
    }
  };
}

async function optionalUser(req: NextRequest): Promise<SessionUser | null> {
  return sessionUserFromRequest(req);
}

async function requireUser(req: NextRequest): Promise<SessionUser> {
  const user = await sessionUserFromRequest(req);
  if (!user) throw new AppError('UNAUTHENTICATED', 'Sign in to continue.');
  return user;
}

async function resolveTeam(
  user: SessionUser,
  params: Record<string, string>,
  options: { permission?: Permission; teamFrom?: TeamSource },
): Promise<TeamContext> {
  const source = options.teamFrom ?? 'active';
  let team: TeamContext | null;
  if (source === 'active') {
    team = await findActiveMembership({ userId: user.id });
  } else {
    const teamId = source === 'path' ? Number(params.teamId) : await source(params);
    // Not a member looks exactly like nothing there.
    team = teamId && Number.isInteger(teamId) && teamId > 0 ? await findMembership({ userId: user.id, teamId }) : null;
  }
  if (!team) throw new AppError('NOT_FOUND', typeof source === 'function' ? 'Not found.' : 'No such team.');
  if (options.permission && !can(team.role, options.permission)) {
    throw new AppError('FORBIDDEN', 'Your role in this team does not allow this.');
  }
  return team;
}

function parseWith<S extends z.ZodType>(schema: S, value: unknown): z.infer<S> {
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    throw new AppError('VALIDATION', 'Some fields need attention.', { fields: zodFields(parsed.error) });
  }
  return parsed.data;
}

function flattenParams(raw: Record<string, string | string[]>): Record<string, string> {
  return Object.fromEntries(Object.entries(raw).map(([k, v]) => [k, Array.isArray(v) ? v.join('/') : v]));
}
