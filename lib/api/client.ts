// The one fetch wrapper of the browser side: JSON in, JSON out, and the API's
// error JSON turned into an ApiError the UI can show (message + field errors).
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
    /** The rest of the error JSON, e.g. `confirm: "implausible"` when the server asks about an unusual number. */
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export interface FetchJsonInit {
  method?: string;
  /** Sent as JSON. (`json` is the same, kept for callers that name it so.) */
  body?: unknown;
  json?: unknown;
  headers?: Record<string, string>;
  signal?: AbortSignal;
}

export async function fetchJson<T>(path: string, init: FetchJsonInit = {}): Promise<T> {
  return (await fetchJsonWithHeaders<T>(path, init)).body;
}

/** fetchJson for answers that carry more in headers (the ledger's total and next cursor) or whose status matters (the offline queue). */
export async function fetchJsonWithHeaders<T>(path: string, init: FetchJsonInit = {}): Promise<{ body: T; headers: Headers; status: number }> {
  const payload = init.json !== undefined ? init.json : init.body;
  let res: Response;
  try {
    res = await fetch(path, {
      method: init.method ?? "GET",
      headers: {
        accept: "application/json",
        ...(payload === undefined ? {} : { "content-type": "application/json" }),
        ...init.headers,
      },
      body: payload === undefined ? undefined : JSON.stringify(payload),
      signal: init.signal,
      credentials: "same-origin",
    });
  } catch (error) {
    if ((error as Error).name === "AbortError") throw error;
    throw new ApiError(0, "network", "We could not reach Cantrove. Check your connection and try again.");
  }
  const text = await res.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = null;
  }
  if (!res.ok) {
    const error = (body as { error?: { code?: string; message?: string; fields?: Record<string, string> } & Record<string, unknown> } | null)?.error;
    throw new ApiError(
      res.status,
      error?.code ?? "http_error",
      error?.message ?? `The server answered ${res.status}. Try again in a moment.`,
      error?.fields ?? {},
      error ?? {},
    );
  }
  return { body: body as T, headers: res.headers, status: res.status };
}

/** The server's question when it asks before recording an unusual number (409, confirm "implausible"), else null. */
export function unusualQuestion(error: unknown): string | null {
  return error instanceof ApiError && error.status === 409 && error.details.confirm === "implausible" ? error.message : null;
}

/** Field errors from a failed mutation, or an empty object. */
export function fieldErrors(error: unknown): Record<string, string> {
  return error instanceof ApiError ? error.fields : {};
}
