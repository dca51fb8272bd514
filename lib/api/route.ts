// The one way to write a route handler in app/api: who may call it (staff roles, or public on
// purpose), its URL params, query and JSON body by zod schema, and every error answered by
// `withErrors` in the `{ error, fields? }` shape.
//
//   export const POST = route(
//     { access: STAFF_ROLES, params: requestIdParams, body: askRiderSchema },
//     async ({ user, params, body }) => Response.json(await askRider(params.id, body.question, user)),
//   );
//
// Order of checks: rate limit, then the guard (401/403), then params (404), query and body (400).
import { NextResponse } from "next/server";
import { z } from "zod";
import { requireRole, type SessionUser } from "@/lib/auth/guard";
import type { Role } from "@/lib/auth/roles";
import { NotFoundError, ValidationError } from "@/lib/errors";
import { withErrors } from "./respond";
import { uuidSchema } from "@/lib/validations/id";

type Access = readonly Role[] | "public";

interface RouteSpec<A extends Access, P extends z.ZodType, Q extends z.ZodType, B extends z.ZodType> {
  /** Roles allowed, or "public" for a handler that is public on purpose (say why beside it). */
  access: A;
  /** URL segments; a value that does not match cannot name a record, so it answers 404 `notFound`. */
  params?: P;
  notFound?: string;
  /** The query string as `{ name: value }`. */
  query?: Q;
  /** The JSON body. An empty body is read as `{}`, so a schema of optional fields accepts it. */
  body?: B;
  /** Zod error map for the body's messages (defaults to the schema's own). */
  bodyErrors?: z.core.$ZodErrorMap;
  /** Runs before anything else, e.g. a rate limiter that throws 429. */
  limit?: (request: Request) => Promise<unknown>;
}

type Out<S> = S extends z.ZodType ? z.output<S> : undefined;

export interface RouteInput<A extends Access, P, Q, B> {
  request: Request;
  /** The signed-in caller for a role route; null on a public one (which checks access itself). */
  user: A extends "public" ? null : SessionUser;
  params: Out<P>;
  query: Out<Q>;
  body: Out<B>;
}

type RouteContext = { params: Promise<Record<string, string | string[]>> };

/** Reads the JSON body; empty means `{}` (an empty POST to approve is "no options"). */
export async function readJson(request: Request): Promise<unknown> {
  const text = await request.text().catch(() => {
    throw new ValidationError("The request body could not be read.");
  });
  if (text.trim() === "") return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new ValidationError("Send the form as JSON.");
  }
}

export function route<
  A extends Access,
  P extends z.ZodType = never,
  Q extends z.ZodType = never,
  B extends z.ZodType = never,
>(
  spec: RouteSpec<A, P, Q, B>,
  handler: (input: RouteInput<A, P, Q, B>) => Promise<Response>,
): (request: Request, context?: RouteContext) => Promise<Response> {
  return withErrors(async (request: Request, context?: RouteContext) => {
    if (spec.limit) await spec.limit(request);
    const user =
      spec.access === "public" ? null : await requireRole(spec.access as readonly Role[], { headers: request.headers });
    let params: unknown = undefined;
    if (spec.params) {
      const parsed = spec.params.safeParse(await context?.params);
      if (!parsed.success) throw new NotFoundError(spec.notFound ?? "Nothing is at this address.");
      params = parsed.data;
    }
    const query = spec.query ? spec.query.parse(Object.fromEntries(new URL(request.url).searchParams)) : undefined;
    const body = spec.body
      ? spec.body.parse(await readJson(request), spec.bodyErrors ? { error: spec.bodyErrors } : undefined)
      : undefined;
    return handler({ request, user, params, query, body } as RouteInput<A, P, Q, B>);
  });
}

/** `[id]` segments that name a row by uuid (lower-cased, as the database stores it). */
export const idParams = z.object({ id: uuidSchema.transform((id) => id.toLowerCase()) });

/** Shorthand for a JSON answer. */
export const json = (data: unknown, status = 200) => NextResponse.json(data, { status });
