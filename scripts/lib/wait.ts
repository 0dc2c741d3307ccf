export async function waitForHealthy(url: string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let last = "no answer";
  while (Date.now() < deadline) {
    try {
      const res = await fetch(url, { signal: AbortSignal.timeout(2_000) });
      if (res.ok) return;
      last = `HTTP ${res.status}`;
    } catch (error) {
      last = (error as Error).message;
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${url} did not become healthy within ${timeoutMs / 1000} s (${last})`);
}

/**
 * Refuses to start when one of the ports is taken: otherwise a server already
 * there (another checkout's `npm start`, say) answers the health check and the
 * run goes on against someone else's app and database.
 */
export async function assertPortsFree(ports: Record<string, number | number[]>, hint: string): Promise<void> {
  const net = await import("node:net");
  const taken: string[] = [];
  for (const [name, value] of Object.entries(ports)) {
    for (const port of [value].flat()) {
      const free = await new Promise<boolean>((resolve) => {
        const probe = net.createServer();
        probe.once("error", () => resolve(false));
        probe.listen(port, "127.0.0.1", () => probe.close(() => resolve(true)));
      });
      if (!free) taken.push(`${port} (${name})`);
    }
  }
  if (taken.length > 0) {
    throw new Error(`port ${taken.join(", ")} already in use on 127.0.0.1: stop what listens there, or ${hint}`);
  }
}
