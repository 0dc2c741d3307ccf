import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync, chmodSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startStack, type Stack } from "@/scripts/lib/stack";
import { startClusterAt, stopClusterAt } from "@/scripts/lib/postgres";
import { waitForHealthy } from "@/scripts/lib/wait";
import { freePort } from "@/tests/support/ports";
import { browserForFile } from "@/tests/support/browser";
import { serverCommand } from "@/scripts/lib/serve";

// A stack of its own, so stopping its database disturbs no other test.
const root = path.resolve(import.meta.dirname, "../..");
const runDir = mkdtempSync(path.join(process.env.CANTROVE_RUN_DIR ?? "/tmp", "outage-"));
chmodSync(runDir, 0o755);
let stack: Stack;
let server: ChildProcess;
let appUrl = "";
let pgPort = 0;
const browser = browserForFile();

beforeAll(async () => {
  pgPort = await freePort();
  const appPort = await freePort();
  appUrl = `http://127.0.0.1:${appPort}`;
  stack = await startStack({
    root,
    stateDir: path.join(runDir, "state"),
    pgDataDir: path.join(runDir, "pgdata"),
    pgPort,
    databaseName: "cantrove",
    smtpPort: await freePort(),
    mailApiPort: await freePort(),
    uploadPort: await freePort(),
    appPort,
    seed: "demo",
    log: () => undefined,
  });
  server = spawn(...serverCommand(root, appPort), {
    cwd: root,
    env: { ...process.env, ...stack.env, NODE_ENV: "production" },
    stdio: "ignore",
  });
  await waitForHealthy(`${appUrl}/api/health`, 60_000);
});

afterAll(async () => {
  server?.kill("SIGTERM");
  await stack?.stop().catch(() => undefined);
  rmSync(runDir, { recursive: true, force: true });
});

async function health() {
  const res = await fetch(`${appUrl}/api/health`);
  return { status: res.status, body: await res.json() };
}

describe("when the database goes away", () => {
  it("answers 503 and a clear page, then recovers on its own", async () => {
    expect(await health()).toEqual({ status: 200, body: { status: "ok", db: "up" } });
    const page = await browser().newPage();
    await page.goto(`${appUrl}/`);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toContain("Empty cans in");

    stopClusterAt(stack.cluster!.dataDir);
    expect(await health()).toEqual({ status: 503, body: { status: "degraded", db: "down" } });
    await page.goto(`${appUrl}/`);
    await page.getByRole("heading", { name: "We can't reach the database" }).waitFor();
    await page.screenshot({ path: path.join(root, ".test-results/database-down.png") });
    const drives = await fetch(`${appUrl}/api/public/drives`);
    expect(drives.status).toBe(503);
    expect((await drives.json()).error.code).toBe("database_unavailable");

    startClusterAt(stack.cluster!.dataDir, pgPort);
    const deadline = Date.now() + 20_000;
    let last = await health();
    while (last.status !== 200 && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 250));
      last = await health();
    }
    expect(last).toEqual({ status: 200, body: { status: "ok", db: "up" } });
    // Pooled connections that died with the old server must not leak errors into pages.
    for (let i = 0; i < 5; i++) expect((await fetch(`${appUrl}/api/public/drives`)).status).toBe(200);
    await page.goto(`${appUrl}/`);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toContain("Empty cans in");
    await page.close();
  }, 120_000);
});
