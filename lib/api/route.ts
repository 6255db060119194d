import type { NextRequest } from 'next/server';
import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { sessionTokenOf, tokenSubject, userAndRoleOf, userFromRequest } from '../auth/session';
import type { SessionUser } from '../auth/users';
import { forbidden, notFound, unauthenticated } from '../errors';
import type { UnitSystem } from '../units/index';
import type { FieldWordTable } from '../validations/field-words';
import { fieldErrorsIn } from '../validations/field-words';
import { can, type Permission } from '../permissions';
import type { Role } from '../roles';
import { parseOrThrow, readJsonBody, type FieldsOf } from './body';
import { errorResponse, json } from './respond';

type RouteContext = { params: Promise<Record<string, string | string[] | undefined>> };
type Infer<S> = S extends z.ZodType ? z.output<S> : undefined;

interface BaseSpec<P extends z.ZodType | undefined, B extends z.ZodType | undefined> {
  /** Path parameters; a malformed id is refused before any database work. */
  params?: P;
  /** JSON body schema (strict objects: unknown fields are refused). */
  body?: B;
  /** Status for a successful plain-data result. @default 200 */
  status?: number;
  /**
   * Largest JSON body for this handler, bytes (a whole-route save is larger than a form). @default
   * RUNNEL_MAX_JSON_BYTES
   */
  maxBodyBytes?: number;
  /** A refused body's fields named as the screen names them, bounds in the unit system `unitsOf` gives. */
  bodyWords?: BodyWords<Infer<P>>;
}

interface TeamSpec<P extends z.ZodType | undefined, B extends z.ZodType | undefined> extends BaseSpec<P, B> {
  permission: Permission;
  /** The team that owns the resource named by the params; null when it does not exist. */
  teamOf: (params: Infer<P>) => Promise<string | null>;
}

/**
 * How a handler words a refused body: one table of the screen's names, and the unit system to state
 * bounds in. A saved record's handler reads its project's system (before the body); a stateless one
 * takes the system the request names. The same input in the same units gets the same words.
 */
export interface BodyWords<P> {
  /** The screen's names; a function of the body as sent where a field's name and unit follow another field (a kind). */
  table: FieldWordTable | ((data: unknown) => FieldWordTable);
  unitsOf: (params: P, req: NextRequest) => Promise<UnitSystem> | UnitSystem;
  /**
   * The number the screen gives the body's first list item, read from the body as sent (a page of rows starts past 1).
   * @default 1
   */
  firstNumberOf?: (data: unknown) => number;
}

export interface PublicContext<P, B> {
  req: NextRequest;
  params: P;
  body: B;
}
export interface UserContext<P, B> extends PublicContext<P, B> {
  user: SessionUser;
}
export interface TeamContext<P, B> extends UserContext<P, B> {
  teamId: string;
  role: Role;
}

type Handler<C> = (ctx: C) => Promise<unknown>;

async function respond(run: () => Promise<unknown>, status: number): Promise<NextResponse> {
  try {
    const result = await run();
    if (result instanceof Response) return result as NextResponse;
    if (result === undefined) return new NextResponse(null, { status: 204 });
    return json(result, status);
  } catch (error) {
    return errorResponse(error);
  }
}

async function parseParams<P extends z.ZodType | undefined>(schema: P, ctx: RouteContext): Promise<Infer<P>> {
  const raw = (await ctx?.params) ?? {};
  return (schema ? parseOrThrow(schema, raw, 'The address names something that cannot exist') : undefined) as Infer<P>;
}

async function parseBody<B extends z.ZodType | undefined>(
  schema: B,
  req: NextRequest,
  maxBytes?: number,
  fieldsOf?: FieldsOf,
): Promise<Infer<B>> {
  return (schema ? await readJsonBody(req, schema, maxBytes, fieldsOf) : undefined) as Infer<B>;
}

/** A refused body worded with the screen's names in the unit system the route names, when it names one. */
async function fieldsOfBody<P>(
  words: BodyWords<P> | undefined,
  params: P,
  req: NextRequest,
): Promise<FieldsOf | undefined> {
  if (!words) return undefined;
  const system = await words.unitsOf(params, req);
  return (error, data) =>
    fieldErrorsIn(
      error,
      system,
      typeof words.table === 'function' ? words.table(data) : words.table,
      words.firstNumberOf?.(data) ?? 1,
    );
}

async function signedInUser(req: NextRequest): Promise<SessionUser> {
  const user = await userFromRequest(req);
  if (!user) throw unauthenticated();
  return user;
}

/** A handler anyone may call (sign-up). Order: params -> body -> act. */
export function publicRoute<P extends z.ZodType | undefined = undefined, B extends z.ZodType | undefined = undefined>(
  spec: BaseSpec<P, B>,
  handler: Handler<PublicContext<Infer<P>, Infer<B>>>,
) {
  return (req: NextRequest, ctx: RouteContext) =>
    respond(async () => {
      const params = (await parseParams(spec.params, ctx)) as Infer<P>;
      const body = (await parseBody(
        spec.body,
        req,
        spec.maxBodyBytes,
        await fieldsOfBody(spec.bodyWords, params, req),
      )) as Infer<B>;
      return handler({ req, params, body });
    }, spec.status ?? 200);
}

/** A handler for any signed-in user. Order: params -> session (401) -> body (400) -> act. */
export function userRoute<P extends z.ZodType | undefined = undefined, B extends z.ZodType | undefined = undefined>(
  spec: BaseSpec<P, B>,
  handler: Handler<UserContext<Infer<P>, Infer<B>>>,
) {
  return (req: NextRequest, ctx: RouteContext) =>
    respond(async () => {
      const params = (await parseParams(spec.params, ctx)) as Infer<P>;
      const user = await signedInUser(req);
      const body = (await parseBody(
        spec.body,
        req,
        spec.maxBodyBytes,
        await fieldsOfBody(spec.bodyWords, params, req),
      )) as Infer<B>;
      return handler({ req, params, body, user });
    }, spec.status ?? 200);
}

/**
 * A handler on a team's resource. Order: params -> session (401) -> membership (404, so a
 * non-member cannot learn the resource exists) -> role (403) -> body (400) -> act.
 */
export function teamRoute<P extends z.ZodType | undefined = undefined, B extends z.ZodType | undefined = undefined>(
  spec: TeamSpec<P, B>,
  handler: Handler<TeamContext<Infer<P>, Infer<B>>>,
) {
  return (req: NextRequest, ctx: RouteContext) =>
    respond(async () => {
      const params = (await parseParams(spec.params, ctx)) as Infer<P>;
      // A request without a session is refused before any lookup; then the resource's team, then
      // the user and their role on it in one query (the session re-read every time).
      const subject = tokenSubject(await sessionTokenOf(req));
      if (!subject) throw unauthenticated();
      const teamId = await spec.teamOf(params);
      const { user, role } = await userAndRoleOf(subject, teamId);
      if (!user) throw unauthenticated();
      if (!teamId || !role) throw notFound();
      if (!can(role, spec.permission)) throw forbidden();
      const body = (await parseBody(
        spec.body,
        req,
        spec.maxBodyBytes,
        await fieldsOfBody(spec.bodyWords, params, req),
      )) as Infer<B>;
      return handler({ req, params, body, user, teamId, role });
    }, spec.status ?? 200);
}
