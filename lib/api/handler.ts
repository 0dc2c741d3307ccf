import "server-only";
import { NextResponse } from "next/server";
import { ZodError, type ZodType } from "zod";
import { AppError, errorBody, invalidInput } from "./errors";
import { isDatabaseUnreachable } from "@/lib/db";
import { forgetReads } from "@/lib/cache/read-cache";

/** Maps anything thrown in a handler to the contract's error JSON. Raw database errors are logged, never shown. */
export function toErrorResponse(error: unknown): NextResponse {
  let appError: AppError;
  if (error instanceof AppError) appError = error;
  else if (error instanceof ZodError) appError = invalidInput(error);
  else if (isDatabaseUnreachable(error)) {
    appError = new AppError("database_unavailable", "We can't reach the database right now. Try again in a minute.");
  } else {
    console.error("[cantrove] unexpected error", error);
    appError = new AppError("internal", "Something went wrong on our side. Try again; if it keeps happening, tell the organisers.");
  }
  return NextResponse.json(errorBody(appError), { status: appError.status });
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

export interface RouteOptions {
  /** The handler never changes people, groups or memberships (ledger writes): its writes keep the cached roles. */
  keepsPeople?: boolean;
}

/** Wraps a route handler so every failure leaves as the contract's error JSON. Any write clears the short read cache. */
export function route<C>(handler: Handler<C>, options: RouteOptions = {}): Handler<C> {
  return async (request, context) => {
    const writes = request.method !== "GET" && request.method !== "HEAD";
    try {
      return await handler(request, context);
    } catch (error) {
      return toErrorResponse(error);
    } finally {
      if (writes) forgetReads(options.keepsPeople ? "data" : "all");
    }
  };
}

/** Reads a JSON body and parses it with the input's schema; bad JSON is a 422 too. */
export async function parseJson<T>(request: Request, schema: ZodType<T>): Promise<T> {
  let raw: unknown;
  try {
    raw = await request.json();
  } catch {
    throw new AppError("invalid_input", "The request body must be JSON.", { fields: { _: "Send a JSON object." } });
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw invalidInput(parsed.error);
  return parsed.data;
}
