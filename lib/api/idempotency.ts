import "server-only";
import { createHash } from "node:crypto";
import { NextResponse } from "next/server";
import type { Knex } from "knex";
import type { ZodType } from "zod";
import { db } from "@/lib/db";
import { AppError, conflict, errorBody, invalidInput } from "./errors";
import type { Actor } from "@/lib/auth/queries";

// The Idempotency-Key rule for every signed-in POST: the same key and body from the same
// person returns the first answer and changes nothing; the same key with
// another body (or another endpoint) is 409. The key row is written in the
// same transaction as the work, so a crash can never leave the work done
// without its key (a retry would double it) or the key without the work.
// A second request racing the first with the same key waits on the key's
// row lock and then replays the committed answer.

export interface IdempotentResult {
  status: number;
  body: unknown;
}

export type IdempotentWork = (trx: Knex.Transaction, rawBody: string) => Promise<IdempotentResult>;

const KEY_PATTERN = /^[\x21-\x7e]{1,200}$/;

interface KeyedRequest {
  key: string | null;
  raw: string;
  method: string;
  path: string;
  bodyHash: string;
}

async function readKeyedRequest(request: Request): Promise<KeyedRequest> {
  const key = request.headers.get("idempotency-key")?.trim() || null;
  if (key !== null && !KEY_PATTERN.test(key)) {
    throw new AppError("invalid_input", "The Idempotency-Key header must be 1–200 visible ASCII characters.", {
      fields: { idempotencyKey: "Use a random id such as a UUID." },
    });
  }
  const raw = await request.text();
  const method = request.method.toUpperCase();
  const path = new URL(request.url).pathname;
  const bodyHash = createHash("sha256").update(canonicalBody(raw)).digest("hex");
  return { key, raw, method, path, bodyHash };
}

function answer(result: IdempotentResult & { replayed: boolean }): Response {
  return NextResponse.json(result.body, {
    status: result.status,
    headers: result.replayed ? { "idempotency-replayed": "true" } : undefined,
  });
}

/** The first answer stored under the key, or 409 when the key was used for another request. */
async function replay(conn: Knex, actor: Actor, r: KeyedRequest) {
  if (r.key === null) throw new Error("replay() needs a request with an Idempotency-Key");
  const first = await conn("idempotency_keys").where({ actor_id: actor.user.id, key: r.key }).first();
  if (!first || first.method !== r.method || first.path !== r.path || first.body_hash !== r.bodyHash) {
    throw conflict("This Idempotency-Key was already used for a different request. Send a new key for a new entry.");
  }
  return { status: first.status as number, body: first.response, replayed: true };
}

export async function withIdempotency(request: Request, actor: Actor, work: IdempotentWork): Promise<Response> {
  const { key, raw, method, path, bodyHash } = await readKeyedRequest(request);

  const result = await db.transaction(async (trx) => {
    if (key) {
      const inserted = await trx("idempotency_keys")
        .insert({ actor_id: actor.user.id, key, method, path, body_hash: bodyHash })
        .onConflict(["actor_id", "key"])
        .ignore()
        .returning("key");
      if (inserted.length === 0) return replay(trx, actor, { key, raw, method, path, bodyHash });
    }
    let outcome: IdempotentResult;
    try {
      // A savepoint, so a refused request still records its answer under the key.
      outcome = await trx.transaction((inner) => work(inner, raw));
    } catch (error) {
      if (!(error instanceof AppError) || error.status >= 500) throw error;
      outcome = { status: error.status, body: errorBody(error) };
    }
    if (key) {
      await trx("idempotency_keys")
        .where({ actor_id: actor.user.id, key })
        .update({ status: outcome.status, response: JSON.stringify(outcome.body) });
    }
    return { ...outcome, replayed: false };
  });

  return answer(result);
}

/**
 * The same rule for a signed-in POST whose work is not a ledger write (a new
 * drive, an invitation, a run…): its work runs in its own transactions, so the
 * key is claimed first (committed, with no answer yet), the work runs, and its
 * answer is stored under the key. A repeat while the first is still running
 * is told to retry; a failure of ours (5xx) gives the key back so a retry can
 * do the work. No connection is held while the work runs.
 */
export async function withKeyedAnswer(request: Request, actor: Actor, work: (rawBody: string) => Promise<IdempotentResult>): Promise<Response> {
  const r = await readKeyedRequest(request);
  if (!r.key) throw new Error("withKeyedAnswer needs an Idempotency-Key");
  const claimed = await db("idempotency_keys")
    .insert({ actor_id: actor.user.id, key: r.key, method: r.method, path: r.path, body_hash: r.bodyHash })
    .onConflict(["actor_id", "key"])
    .ignore()
    .returning("key");
  if (claimed.length === 0) {
    const first = await db("idempotency_keys").where({ actor_id: actor.user.id, key: r.key }).first();
    if (first && first.status === null && first.method === r.method && first.path === r.path && first.body_hash === r.bodyHash) {
      throw conflict("The first request with this Idempotency-Key is still being handled. Try again in a moment.");
    }
    return answer(await replay(db, actor, r));
  }
  let outcome: IdempotentResult;
  try {
    outcome = await work(r.raw);
  } catch (error) {
    if (!(error instanceof AppError) || error.status >= 500) {
      await db("idempotency_keys").where({ actor_id: actor.user.id, key: r.key }).delete();
      throw error;
    }
    outcome = { status: error.status, body: errorBody(error) };
  }
  await db("idempotency_keys").where({ actor_id: actor.user.id, key: r.key }).update({ status: outcome.status, response: JSON.stringify(outcome.body) });
  return answer({ ...outcome, replayed: false });
}

/** Work that is one SQL call whose answer is known before it runs. */
export interface PreparedStatement {
  status: number;
  body: unknown;
  /** A scalar SQL expression, e.g. `ledger_post(?::jsonb)`. */
  sql: string;
  bindings: readonly Knex.RawBinding[];
  /** Turns the statement's own refusals into an AppError; others stay 500. */
  refusal?: (error: unknown) => AppError | null;
}

/**
 * The same rule as withIdempotency for work that is a single statement: the
 * key row with its answer and the work are one statement, so they commit
 * together and no lock is held across a network round trip. A refusal
 * (bad input, or the statement's own) is stored under the key on its own.
 */
export async function withIdempotentStatement(
  request: Request,
  actor: Actor,
  prepare: (rawBody: string) => Promise<PreparedStatement>,
): Promise<Response> {
  const r = await readKeyedRequest(request);
  const keyValues = (status: number, body: unknown) => [actor.user.id, r.key, r.method, r.path, r.bodyHash, status, JSON.stringify(body)];
  const insertKey = `insert into idempotency_keys (actor_id, key, method, path, body_hash, status, response)
                     values (?, ?, ?, ?, ?, ?, ?::jsonb) on conflict (actor_id, key) do nothing returning 1`;
  let outcome: IdempotentResult;
  try {
    const p = await prepare(r.raw);
    try {
      if (!r.key) {
        await db.raw(`select ${p.sql}`, p.bindings);
      } else {
        const { rows } = await db.raw(`with k as (${insertKey}) select exists (select 1 from k) as fresh, (select ${p.sql} from k) as done`, [
          ...keyValues(p.status, p.body),
          ...p.bindings,
        ]);
        if (!rows[0].fresh) return answer(await replay(db, actor, r));
      }
    } catch (error) {
      throw p.refusal?.(error) ?? error;
    }
    return answer({ status: p.status, body: p.body, replayed: false });
  } catch (error) {
    if (!(error instanceof AppError) || error.status >= 500) throw error;
    outcome = { status: error.status, body: errorBody(error) };
  }
  if (r.key) {
    const { rows } = await db.raw(insertKey, keyValues(outcome.status, outcome.body));
    if (rows.length === 0) return answer(await replay(db, actor, r));
  }
  return answer({ ...outcome, replayed: false });
}

/** Whitespace and key order do not make a different request. */
function canonicalBody(raw: string): string {
  try {
    return JSON.stringify(sortKeys(JSON.parse(raw)));
  } catch {
    return raw;
  }
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeys);
  if (value && typeof value === "object") {
    return Object.fromEntries(Object.entries(value as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : 1)).map(([k, v]) => [k, sortKeys(v)]));
  }
  return value;
}

/** Parses the raw body a handler received from withIdempotency; bad JSON or input is 422. */
export function parseBody<T>(raw: string, schema: ZodType<T>): T {
  let value: unknown;
  try {
    value = raw.trim() === "" ? {} : JSON.parse(raw);
  } catch {
    throw new AppError("invalid_input", "The request body must be JSON.", { fields: { _: "Send a JSON object." } });
  }
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw invalidInput(parsed.error);
  return parsed.data;
}
