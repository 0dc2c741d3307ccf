import { QueryClient, QueryClientProvider, type DefaultOptions } from "@tanstack/react-query";
import type { RequestHandler } from "msw";
import { setupServer, type SetupServer } from "msw/node";
import type { ReactNode } from "react";
import { afterAll, afterEach, beforeAll } from "vitest";

/**
 * A mocked API for the whole test file (msw intercepts fetch): listens before
 * the first test and refuses any request no handler answers, drops per-test
 * handlers and runs `reset` after each test, closes after the last.
 */
export function mockApi(handlers: RequestHandler[], reset: () => void = () => undefined): SetupServer {
  const server = setupServer(...handlers);
  beforeAll(() => server.listen({ onUnhandledRequest: "error" }));
  afterEach(() => {
    server.resetHandlers();
    reset();
  });
  afterAll(() => server.close());
  return server;
}

/** A fresh query client that never retries, and the provider to render hooks in. */
export function testQueryClient(queries: DefaultOptions["queries"] = {}) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false, ...queries }, mutations: { retry: false } } });
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
  return { client, wrapper };
}
