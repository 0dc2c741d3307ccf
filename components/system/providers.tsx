"use client";

import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState } from "react";
import { z } from "zod";

// Zod probes for eval (new Function) to compile its parsers; in the browser the
// Content-Security-Policy forbids eval, so the probe would only log a violation.
// The server keeps the compiled parsers.
z.config({ jitless: true });

export function Providers({ children }: { children: React.ReactNode }) {
  const [client] = useState(
    () => new QueryClient({ defaultOptions: { queries: { staleTime: 10_000, retry: 1, refetchOnWindowFocus: true } } }),
  );
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
