import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ApiClient, signedIn } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { demoFixture, type DemoFixture } from "@/tests/support/fixtures";
import { closeTestDb } from "@/tests/support/db";
import { EVERYONE, type AuthzRow, type Who } from "./types";

// Every route handler, every caller: the expected status for each. Adding a
// route (or a method) without a row in a rows-*.ts file fails this test.
const here = path.dirname(new URL(import.meta.url).pathname);
const root = path.resolve(here, "../../..");

async function loadRows(): Promise<AuthzRow[]> {
  const files = readdirSync(here).filter((f) => /^rows-.+\.ts$/.test(f));
  const modules = await Promise.all(files.map((f) => import(path.join(here, f)) as Promise<{ rows: AuthzRow[] }>));
  return modules.flatMap((m) => m.rows);
}

function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const full = path.join(dir, entry);
    if (statSync(full).isDirectory()) return routeFiles(full);
    return /^route(\.bench)?\.ts$/.test(entry) ? [path.relative(root, full)] : [];
  });
}

function exportedMethods(file: string): string[] {
  const text = readFileSync(path.join(root, file), "utf8");
  const found = new Set<string>();
  for (const m of text.matchAll(/export\s+(?:const|async function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g)) found.add(m[1]);
  for (const m of text.matchAll(/export\s*(?:const\s*)?\{([^}]*)\}/g)) {
    for (const name of m[1].matchAll(/\b(GET|POST|PUT|PATCH|DELETE)\b/g)) found.add(name[1]);
  }
  return [...found];
}

let fixture: DemoFixture;
const clients = {} as Record<Who, ApiClient>;
let rows: AuthzRow[] = [];

beforeAll(async () => {
  fixture = await demoFixture();
  rows = await loadRows();
  clients.anonymous = new ApiClient();
  clients.volunteer = await signedIn(DEMO.volunteer);
  clients.builder = await signedIn(DEMO.builder);
  clients.organiser = await signedIn(DEMO.organiser);
  clients.otherOrganiser = await signedIn(DEMO.otherOrganiser);
});

afterAll(closeTestDb);

describe("authorisation table", () => {
  it("has a row for every method of every route handler", async () => {
    const covered = new Set(rows.map((r) => `${r.method} ${r.route}`));
    const missing = routeFiles(path.join(root, "app/api")).flatMap((file) =>
      exportedMethods(file).map((m) => `${m} ${file}`).filter((key) => !covered.has(key)),
    );
    expect(missing).toEqual([]);
    expect(rows.length).toBeGreaterThan(0);
  });

  it("answers each caller with the expected status", async () => {
    const failures: string[] = [];
    for (const row of rows) {
      for (const who of EVERYONE) {
        const body = row.body?.(fixture);
        const started = Date.now();
        let res: Response;
        try {
          res = await clients[who].request(row.method, row.path(fixture), body);
          await res.arrayBuffer();
        } catch (error) {
          failures.push(`${row.method} ${row.path(fixture)} as ${who}: ${(error as Error).message} after ${Date.now() - started} ms`);
          continue;
        }
        const allowed = ([] as number[]).concat(row.expect[who]);
        if (!allowed.includes(res.status)) {
          failures.push(`${row.method} ${row.path(fixture)} as ${who}: got ${res.status}, expected ${allowed.join("|")}`);
        }
        if (res.status === 401 || res.status === 403 || res.status === 404) {
          // Refusals from our own handlers must carry the contract's error JSON.
          const type = res.headers.get("content-type") ?? "";
          // A *.bench.ts route is not in this build (only CANTROVE_BENCH=1 adds it): its 404 is Next's own page.
          const ours = !row.route.includes("[...nextauth]") && !row.route.includes("uploadthing") && !row.route.endsWith(".bench.ts");
          if (row.route.includes("/api/") && ours && !type.includes("json")) {
            failures.push(`${row.method} ${row.path(fixture)} as ${who}: ${res.status} without JSON`);
          }
        }
      }
    }
    expect(failures).toEqual([]);
  }, 300_000);

  it("declares every handler through endpoint(), so none can skip its checks", () => {
    // next-auth's own handler is the one exception: its POSTs check its own CSRF token.
    const undeclared = routeFiles(path.join(root, "app/api"))
      .filter((file) => !file.includes("[...nextauth]"))
      .flatMap((file) => {
        const text = readFileSync(path.join(root, file), "utf8");
        return exportedMethods(file).filter((m) => !new RegExp(`export const ${m}\\s*=\\s*endpoint(\\.\\w+)?\\(`).test(text)).map((m) => `${m} ${file}`);
      });
    expect(undeclared).toEqual([]);
  });

  // Cross-site request forgery: what a page on another site (or the upload
  // service's origin, which is same-site) can make a signed-in browser send.
  // Sec-Fetch-Site and Origin are set by browsers, never by page scripts
  // (Fetch standard, "forbidden request-header" names).
  it("refuses every cross-site write, whoever is signed in", async () => {
    const failures: string[] = [];
    const writes = rows.filter((r) => r.method !== "GET" && !r.route.includes("[...nextauth]"));
    expect(writes.length).toBeGreaterThan(20);
    const forged: Record<string, string>[] = [
      { "sec-fetch-site": "cross-site", origin: "http://evil.example" },
      { "sec-fetch-site": "same-site", origin: "http://127.0.0.1:1" },
      { origin: "http://evil.example" },
    ];
    for (const row of writes) {
      for (const headers of forged) {
        const res = await clients.organiser.request(row.method, row.path(fixture), row.body?.(fixture), headers);
        await res.arrayBuffer();
        if (res.status !== 403) failures.push(`${row.method} ${row.path(fixture)} with ${JSON.stringify(headers)}: ${res.status}`);
      }
    }
    expect(failures).toEqual([]);
  }, 300_000);

  it("takes JSON bodies only as application/json (a form or text/plain post is 415)", async () => {
    const failures: string[] = [];
    const withBodies = rows.filter((r) => r.method !== "GET" && r.body && !r.route.includes("[...nextauth]") && !r.route.includes("uploadthing"));
    expect(withBodies.length).toBeGreaterThan(10);
    for (const row of withBodies) {
      const who = EVERYONE.find((w) => ([] as number[]).concat(row.expect[w]).some((s) => s === 422 || (s >= 200 && s < 300))) ?? "organiser";
      for (const type of ["text/plain", "application/x-www-form-urlencoded"]) {
        const res = await clients[who].request(row.method, row.path(fixture), JSON.stringify(row.body!(fixture)), { "content-type": type });
        await res.arrayBuffer();
        if (res.status !== 415) failures.push(`${row.method} ${row.path(fixture)} as ${who} with ${type}: ${res.status}`);
      }
    }
    expect(failures).toEqual([]);
  }, 300_000);
});
