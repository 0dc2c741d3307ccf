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
    return entry === "route.ts" ? [path.relative(root, full)] : [];
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
          if (row.route.includes("/api/") && !row.route.includes("[...nextauth]") && !row.route.includes("uploadthing") && !type.includes("json")) {
            failures.push(`${row.method} ${row.path(fixture)} as ${who}: ${res.status} without JSON`);
          }
        }
      }
    }
    expect(failures).toEqual([]);
  }, 300_000);
});
