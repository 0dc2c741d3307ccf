import "server-only";
import { NextResponse } from "next/server";
import { ZodError } from "zod";
import { AppError, errorBody, invalidInput } from "./errors";
import { isDatabaseUnreachable } from "@/lib/db";
import { appErrorFromDatabase } from "./pg-errors";

/** Anything thrown in a handler or a server action as the AppError people may see. Raw database errors are logged, never shown. */
export function toAppError(error: unknown): AppError {
  let appError: AppError;
  if (error instanceof AppError) appError = error;
  else if (error instanceof ZodError) appError = invalidInput(error);
  else if (appErrorFromDatabase(error)) {
    console.warn("[cantrove] refused by the database", (error as Error).message);
    appError = appErrorFromDatabase(error)!;
  } else if (isDatabaseUnreachable(error)) {
    appError = new AppError("database_unavailable", "We can't reach the database right now. Try again in a minute.");
  } else {
    console.error("[cantrove] unexpected error", error);
    appError = new AppError("internal", "Something went wrong on our side. Try again; if it keeps happening, tell the organisers.");
  }
  return appError;
}

/** Maps anything thrown in a handler to the contract's error JSON. */
export function toErrorResponse(error: unknown): NextResponse {
  const appError = toAppError(error);
  const retryAfter = Number(appError.details?.retryAfter);
  const headers = appError.code === "rate_limited" && retryAfter > 0 ? { "retry-after": String(Math.ceil(retryAfter)) } : undefined;
  return NextResponse.json(errorBody(appError), { status: appError.status, headers });
}
