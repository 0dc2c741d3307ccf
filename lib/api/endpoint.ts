import "server-only";
import { ANSWER_FOR_HEADER, ANSWER_GROUP_HEADER } from "@/lib/offline/marker";
import { NextResponse, type NextRequest } from "next/server";
import type { Knex } from "knex";
import type { ZodType } from "zod";
import { AppError, conflict, invalidInput, notFound } from "./errors";
import { toErrorResponse } from "./handler";
import { withIdempotency, withIdempotentStatement, withKeyedAnswer, type PreparedStatement } from "./idempotency";
import { assertJsonContent, assertNoNul, assertSameOrigin } from "./request-guards";
import { consumeLimit } from "./rate-limit";
import type { KeyedLimit } from "./rate-limit-rules";
import { requireRole, requireUser } from "@/lib/auth/session";
import type { Actor } from "@/lib/auth/queries";
import type { Role } from "@/lib/auth/roles";
import { forgetEverywhere } from "@/lib/cache/broadcast";
import { clientAddress } from "@/lib/net/client-address";

// One declaration per route handler: who may call it, the schemas of its path,
// query and body, the resource it acts on (resolved by that resource's own
// resolver in lib/<domain>/, which filters by the actor's group in SQL), its
// idempotency and its rate limits. Every declared handler makes the same checks
// in the same order, so a new route cannot forget one:
//   cross-site refusal → session and role → path (non-UUID id = 404) → resource
//   (another group's = 404) → query → JSON content type → NUL bytes → body
//   schema (422) → rate limits (429 with Retry-After) → the work.
// Database refusals (unique, foreign key, range) come back as 409/422, an
// unreachable database as 503, anything else as a logged 500.

export type Access = "anyone" | "member" | readonly Role[];
type ActorOf<A extends Access> = A extends "anyone" ? Actor | null : Actor;

/** Loads the record a route acts on, or throws 404 (another group's record is 404 too) or 403. */
export type Resolver<P, R> = (actor: Actor, params: P) => Promise<R>;

/** "client": the caller's address (from the app's own server); a function: a key from the path or body (an e-mail address, say), or null to skip. */
export type Limit<P, B> = KeyedLimit<P, B>;

export interface EndpointSpec<A extends Access, P, Q, B, R> {
  who: A;
  params?: ZodType<P>;
  query?: ZodType<Q>;
  body?: ZodType<B>;
  resource?: Resolver<P, R>;
  limits?: readonly Limit<P, B>[];
  /** 201 for creations; the default is 200. */
  status?: number;
  /** The handler never changes people, groups or memberships (ledger writes): its writes keep the cached roles. */
  keepsPeople?: boolean;
}

export interface EndpointContext<A extends Access, P, Q, B, R> {
  request: NextRequest;
  actor: ActorOf<A>;
  params: P;
  query: Q;
  body: B;
  /** The body as sent, for the rare handler that must echo a value exactly as the caller wrote it. */
  raw: string;
  resource: R;
}

type NextContext = { params?: Promise<Record<string, string | string[]>> };
type Work<T> = T | Response;

async function pathOf<P>(ctx: NextContext, schema?: ZodType<P>): Promise<P> {
  const raw = (await ctx.params) ?? {};
  if (!schema) return raw as P;
  const parsed = schema.safeParse(raw);
  // A path that cannot name a record names none: 404, with the label the schema gives.
  if (!parsed.success) throw notFound(parsed.error.issues[0]?.message || "That record");
  assertNoNul(parsed.data);
  return parsed.data;
}

function queryOf<Q>(request: Request, schema?: ZodType<Q>): Q {
  if (!schema) return undefined as Q;
  const raw = Object.fromEntries(new URL(request.url).searchParams);
  assertNoNul(raw);
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw invalidInput(parsed.error);
  return parsed.data;
}

/** Parses a raw body against the route's schema with the wrapper's own checks. */
export function bodyOf<B>(request: Request, raw: string, schema?: ZodType<B>): B {
  if (!schema) return undefined as B;
  assertJsonContent(request, raw);
  let value: unknown;
  try {
    value = raw.trim() === "" ? {} : JSON.parse(raw);
  } catch {
    throw new AppError("invalid_input", "The request body must be JSON.", { fields: { _: "Send a JSON object." } });
  }
  assertNoNul(value);
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw invalidInput(parsed.error);
  return parsed.data;
}

export async function actorFor(who: Access): Promise<Actor | null> {
  // Open routes read no session; the few that care who is asking (accepting an invitation) ask themselves.
  if (who === "anyone") return null;
  if (who === "member") return requireUser();
  return requireRole(...who);
}

/** Only well-formed requests count: a refused body sends no mail and writes nothing, and a test's bad input never uses a person's allowance. */
async function applyLimits<P, B>(request: Request, limits: readonly Limit<P, B>[], input: { params: P; body: B }) {
  for (const limit of limits) {
    const key = limit.by === "client" ? clientAddress(request.headers) : limit.by(input);
    if (key) await consumeLimit(limit.rule, key.toLowerCase());
  }
}

/**
 * An entry that waited on a phone names the person who typed it (X-Cantrove-Entered-By, the
 * user id, set by the offline queue). Sent while someone else is signed in, it is refused
 * (409) before anything runs: it must never be filed under the new person's name.
 */
export const ENTERED_BY_HEADER = "x-cantrove-entered-by";
function assertEnteredBy(request: Request, actor: Actor | null): void {
  const by = request.headers.get(ENTERED_BY_HEADER);
  if (by === null || request.method === "GET") return;
  if (!actor || actor.user.id !== by) {
    throw conflict("This entry was made on this phone by someone else who was signed in then; it was not recorded under your name.");
  }
}

/**
 * Whose answer this is: every read made for a signed-in person names them and their group.
 * The service worker (app/sw.ts) keeps an answer offline only in the cache of the person and
 * group it names, and only while they are still the ones signed in on the phone, so an answer
 * still on its way when someone signs out or switches cannot land in another person's copies.
 */
function markedFor(response: Response, actor: Actor): Response {
  const mark = (r: Response) => {
    r.headers.set(ANSWER_FOR_HEADER, actor.user.id);
    r.headers.set(ANSWER_GROUP_HEADER, actor.group.id);
    return r;
  };
  try {
    return mark(response);
  } catch {
    return mark(new Response(response.body, response)); // headers that cannot be changed (a fetched answer passed through): a copy that can
  }
}

/** What every declared handler shares: the checks before the body, and the error and cache handling around it. */
function wrap<A extends Access, P, Q, B, R>(
  spec: EndpointSpec<A, P, Q, B, R>,
  run: (pre: Omit<EndpointContext<A, P, Q, B, R>, "body" | "raw">) => Promise<Response>,
) {
  return async (request: NextRequest, ctx: NextContext): Promise<Response> => {
    const writes = request.method !== "GET" && request.method !== "HEAD";
    let response: Response;
    let actor: ActorOf<A> | null = null;
    try {
      assertSameOrigin(request);
      actor = (await actorFor(spec.who)) as ActorOf<A>;
      assertEnteredBy(request, actor as Actor | null);
      const params = await pathOf(ctx, spec.params);
      const resource = spec.resource ? await spec.resource(actor as Actor, params) : (undefined as R);
      const query = queryOf(request, spec.query);
      response = await run({ request, actor: actor as ActorOf<A>, params, query, resource });
    } catch (error) {
      response = toErrorResponse(error);
    }
    if (!writes && actor) response = markedFor(response, actor as Actor);
    // A refused write (4xx: 401, 403, 404, 409, 422, 429) changed nothing, so it
    // does not tell every server to clear its cache: a stranger's flood of bad posts
    // must not cost a NOTIFY each and empty every cache. A 5xx may follow a commit.
    const refused = response.status >= 400 && response.status < 500;
    if (writes && !refused) await forgetEverywhere(spec.keepsPeople ? "data" : "all");
    return response;
  };
}

/** A handler's answer in the form kept under an Idempotency-Key. */
async function stored(result: unknown, status: number): Promise<{ status: number; body: unknown }> {
  if (!(result instanceof Response)) return { status, body: result ?? null };
  const text = await result.text();
  return { status: result.status, body: text ? JSON.parse(text) : null };
}

function respond(result: unknown, status: number): Response {
  return result instanceof Response ? result : NextResponse.json(result ?? null, { status });
}

/** A route handler from its declaration. The handler returns JSON-able data (sent with `status`) or a Response. */
export function endpoint<A extends Access, P = Record<string, never>, Q = undefined, B = undefined, R = undefined, T = unknown>(
  spec: EndpointSpec<A, P, Q, B, R>,
  handler: (ctx: EndpointContext<A, P, Q, B, R>) => Promise<Work<T>>,
) {
  return wrap(spec, async (pre) => {
    // A signed-in POST with an Idempotency-Key keeps its first answer under the key (CONTRACT).
    if (pre.request.method === "POST" && pre.actor && pre.request.headers.has("idempotency-key")) {
      return withKeyedAnswer(pre.request, pre.actor as Actor, async (raw) => {
        const body = bodyOf(pre.request, raw, spec.body);
        await applyLimits(pre.request, spec.limits ?? [], { params: pre.params, body });
        return stored(await handler({ ...pre, body, raw }), spec.status ?? 200);
      });
    }
    const raw = spec.body ? await pre.request.text() : "";
    const body = bodyOf(pre.request, raw, spec.body);
    await applyLimits(pre.request, spec.limits ?? [], { params: pre.params, body });
    return respond(await handler({ ...pre, body, raw }), spec.status ?? 200);
  });
}

/**
 * A ledger write under the Idempotency-Key rule (lib/api/idempotency.ts): the body
 * is read inside the key's transaction, so a refusal (422 included) is the answer
 * stored under the key, and the work runs in that transaction.
 */
endpoint.idempotent = function idempotent<A extends Exclude<Access, "anyone">, P, B, R, T>(
  spec: EndpointSpec<A, P, undefined, B, R>,
  handler: (ctx: EndpointContext<A, P, undefined, B, R> & { trx: Knex.Transaction }) => Promise<T>,
) {
  return wrap(spec, async (pre) =>
    withIdempotency(pre.request, pre.actor as Actor, async (trx, raw) => {
      const body = bodyOf(pre.request, raw, spec.body);
      return { status: spec.status ?? 201, body: await handler({ ...pre, body, raw, trx }) };
    }),
  );
};

/** The same rule for work that is one SQL statement whose answer is known beforehand (see withIdempotentStatement). */
endpoint.statement = function statement<A extends Exclude<Access, "anyone">, P, B, R>(
  spec: EndpointSpec<A, P, undefined, B, R> & {
    /** The statement checks the resource itself; when the body is refused first, this runs so another group's record is still 404. */
    checkOnRefusal?: Resolver<P, unknown>;
  },
  prepare: (ctx: EndpointContext<A, P, undefined, B, R>) => Promise<Omit<PreparedStatement, "status"> & { status?: number }>,
) {
  return wrap(spec, async (pre) =>
    withIdempotentStatement(pre.request, pre.actor as Actor, async (raw) => {
      let body: B;
      try {
        body = bodyOf(pre.request, raw, spec.body);
      } catch (error) {
        await spec.checkOnRefusal?.(pre.actor as Actor, pre.params);
        throw error;
      }
      return { status: spec.status ?? 201, ...(await prepare({ ...pre, body, raw })) };
    }),
  );
};
