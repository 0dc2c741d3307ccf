import "server-only";
import { createHash } from "node:crypto";
import { NextResponse } from "next/server";
import type { Knex } from "knex";
import type { ZodType } from "zod";
import { db } from "@/lib/db";
import { AppError, conflict, errorBody, invalidInput } from "./errors";
import type { Actor } from "@/lib/auth/queries";

// The Idempotency-Key rule for every POST: the same key and body from the same
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

export async function withIdempotency(request: Request, actor: Actor, work: IdempotentWork): Promise<Response> {
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

  const result = await db.transaction(async (trx) => {
    if (key) {
      const inserted = await trx("idempotency_keys")
        .insert({ actor_id: actor.user.id, key, method, path, body_hash: bodyHash })
        .onConflict(["actor_id", "key"])
        .ignore()
        .returning("key");
      if (inserted.length === 0) {
        const first = await trx("idempotency_keys").where({ actor_id: actor.user.id, key }).first();
        if (!first || first.method !== method || first.path !== path || first.body_hash !== bodyHash) {
          throw conflict("This Idempotency-Key was already used for a different request. Send a new key for a new entry.");
        }
        return { status: first.status as number, body: first.response, replayed: true };
      }
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

  return NextResponse.json(result.body, {
    status: result.status,
    headers: result.replayed ? { "idempotency-replayed": "true" } : undefined,
  });
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
