"use client";

import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState } from "react";

// Zod probes for eval (new Function) before compiling its parsers; under the
// Content-Security-Policy (proxy.ts) the probe is blocked and reported as a
// violation. This is the object `z.config({ jitless: true })` writes to, set
// without importing zod here, which would put all of zod into every page's
// first load. Browser only: the server keeps the compiled parsers.
// tests/e2e/csp.test.ts fails if a zod upgrade stops honouring it.
if (typeof window !== "undefined") {
  const scope = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
  (scope.__zod_globalConfig ??= {}).jitless = true;
}

export function Providers({ children }: { children: React.ReactNode }) {
  const [client] = useState(
    () => new QueryClient({ defaultOptions: { queries: { staleTime: 10_000, retry: 1, refetchOnWindowFocus: true } } }),
  );
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
