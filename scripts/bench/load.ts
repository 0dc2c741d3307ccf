import { randomUUID } from "node:crypto";
// @ts-expect-error autocannon ships no type declarations
import autocannon from "autocannon";

// One load run: autocannon over loopback at a fixed connection count. The
// latencies of every response are kept so p95 is exact (autocannon's own
// summary has p97.5, not p95).
export interface LoadTarget {
  name: string;
  method: "GET" | "POST";
  path: string;
  headers?: Record<string, string>;
  body?: string;
  /** A fresh Idempotency-Key on every request. */
  uniqueKey?: boolean;
}

export interface LoadResult {
  name: string;
  path: string;
  method: string;
  requests: number;
  seconds: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  max: number;
  non2xx: number;
  errors: number;
  timeouts: number;
  statuses: Record<string, number>;
}

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i];
}

export async function runLoad(baseUrl: string, t: LoadTarget, o: { connections: number; seconds: number }): Promise<LoadResult> {
  const latencies: number[] = [];
  const statuses: Record<string, number> = {};
  const started = Date.now();
  const result = await new Promise<{ errors: number; timeouts: number; non2xx: number; duration: number }>((resolve, reject) => {
    const instance = autocannon(
      {
        url: baseUrl,
        connections: o.connections,
        duration: o.seconds,
        timeout: 10,
        requests: [
          {
            method: t.method,
            path: t.path,
            headers: { ...(t.body ? { "content-type": "application/json" } : {}), ...t.headers },
            body: t.body,
            ...(t.uniqueKey
              ? { setupRequest: (req: { headers: Record<string, string> }) => ({ ...req, headers: { ...req.headers, "idempotency-key": randomUUID() } }) }
              : {}),
          },
        ],
      },
      (err: Error | null, res: { errors: number; timeouts: number; non2xx: number; duration: number }) => (err ? reject(err) : resolve(res)),
    );
    instance.on("response", (_client: unknown, statusCode: number, _bytes: number, responseTime: number) => {
      latencies.push(responseTime);
      statuses[statusCode] = (statuses[statusCode] ?? 0) + 1;
    });
  });
  const seconds = result.duration || (Date.now() - started) / 1000;
  latencies.sort((a, b) => a - b);
  const round = (n: number) => Math.round(n * 100) / 100;
  return {
    name: t.name,
    path: t.path,
    method: t.method,
    requests: latencies.length,
    seconds: round(seconds),
    rps: round(latencies.length / seconds),
    p50: round(percentile(latencies, 50)),
    p95: round(percentile(latencies, 95)),
    p99: round(percentile(latencies, 99)),
    max: round(latencies[latencies.length - 1] ?? NaN),
    non2xx: result.non2xx,
    errors: result.errors,
    timeouts: result.timeouts,
    statuses,
  };
}
