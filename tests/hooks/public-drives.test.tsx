import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { http, HttpResponse, delay } from "msw";
import { setupServer } from "msw/node";
import { QueryClient, QueryClientProvider, useQuery } from "@tanstack/react-query";
import { renderHook, waitFor } from "@testing-library/react";
import type { ReactNode } from "react";
import { publicDriveQueries } from "@/hooks/queries/public-drives";
import { ApiError } from "@/lib/api/client";

// react-query + the fetch wrapper against mocked API answers (msw).
const server = setupServer();
beforeAll(() => server.listen({ onUnhandledRequest: "error" }));
afterEach(() => server.resetHandlers());
afterAll(() => server.close());

function wrapper() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

const url = new URL("/api/public/drives", location.origin).toString();

describe("public drives query", () => {
  it("returns the drives the API sends", async () => {
    server.use(http.get(url, () => HttpResponse.json([{ slug: "a", name: "A drive", startsOn: "2026-11-01", endsOn: "2026-12-01" }])));
    const { result } = renderHook(() => useQuery(publicDriveQueries.list()), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    expect(result.current.data?.map((d) => d.slug)).toEqual(["a"]);
  });

  it("turns the contract's error JSON into an ApiError with code and message", async () => {
    server.use(
      http.get(url, () =>
        HttpResponse.json({ error: { code: "database_unavailable", message: "We can't reach the database right now." } }, { status: 503 }),
      ),
    );
    const { result } = renderHook(() => useQuery(publicDriveQueries.list()), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.isError).toBe(true));
    const error = result.current.error as ApiError;
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(503);
    expect(error.code).toBe("database_unavailable");
  });

  it("stays in its loading state while a slow answer is on its way", async () => {
    server.use(
      http.get(url, async () => {
        await delay(300);
        return HttpResponse.json([]);
      }),
    );
    const { result } = renderHook(() => useQuery(publicDriveQueries.list()), { wrapper: wrapper() });
    await new Promise((r) => setTimeout(r, 150));
    expect(result.current.isPending).toBe(true);
    await waitFor(() => expect(result.current.isSuccess).toBe(true), { timeout: 2_000 });
    expect(result.current.data).toEqual([]);
  });

  it("reports a dropped connection as a network error the UI can explain", async () => {
    server.use(http.get(url, () => HttpResponse.error()));
    const { result } = renderHook(() => useQuery(publicDriveQueries.list()), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.isError).toBe(true));
    expect((result.current.error as ApiError).code).toBe("network");
  });
});
