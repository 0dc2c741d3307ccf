import { spawn, type ChildProcess } from "node:child_process";
import { randomUUID } from "node:crypto";
import { chmodSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import path from "node:path";
import knex from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startStack, type Stack } from "@/scripts/lib/stack";
import { startClusterAt, stopClusterAt } from "@/scripts/lib/postgres";
import { startMailFake, readMail, type MailFake } from "@/scripts/fakes/mail-fake";
import { startUploadFake } from "@/scripts/fakes/upload-fake";
import { pngBytes } from "@/tests/support/images";
import { waitForHealthy } from "@/scripts/lib/wait";
import { freePort } from "@/tests/support/ports";
import { ApiClient } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { serverCommand } from "@/scripts/lib/serve";
import type { TestDb } from "@/tests/support/db";

// Faults on a stack of its own: the database stopped under writes, the mail
// service down while a pledge is mailed, the upload service down for an upload.
const root = path.resolve(import.meta.dirname, "../..");
const runDir = mkdtempSync(path.join(process.env.CANTROVE_RUN_DIR ?? "/tmp", "faults-"));
chmodSync(runDir, 0o755);
const ports = { pg: 0, app: 0, smtp: 0, mailApi: 0, upload: 0 };
let stack: Stack;
let server: ChildProcess;
let appUrl = "";
let db: TestDb;

beforeAll(async () => {
  for (const k of Object.keys(ports) as (keyof typeof ports)[]) ports[k] = await freePort();
  appUrl = `http://127.0.0.1:${ports.app}`;
  stack = await startStack({
    root, stateDir: path.join(runDir, "state"), pgDataDir: path.join(runDir, "pgdata"), pgPort: ports.pg, databaseName: "cantrove",
    smtpPort: ports.smtp, mailApiPort: ports.mailApi, uploadPort: ports.upload, appPort: ports.app, seed: "demo", log: () => undefined,
  });
  server = spawn(...serverCommand(root, ports.app), {
    cwd: root,
    env: { ...process.env, ...stack.env, NODE_ENV: "production", MAIL_POLL_SECONDS: "0.5" },
    stdio: "ignore",
  });
  await waitForHealthy(`${appUrl}/api/health`, 60_000);
  db = knex({ client: "pg", connection: stack.env.DATABASE_URL, pool: { min: 0, max: 2 } }) as TestDb;
});

afterAll(async () => {
  await db?.destroy();
  server?.kill("SIGTERM");
  await stack?.stop().catch(() => undefined);
  rmSync(runDir, { recursive: true, force: true });
});

async function volunteer(): Promise<ApiClient> {
  const c = new ApiClient(appUrl);
  expect(await c.signIn(DEMO.volunteer)).toBe(200);
  return c;
}

/** What the volunteer app does: send once with a fresh key, and on any failure send the same request again. */
async function writeUntilAcknowledged(c: ApiClient, url: string, body: unknown, deadline: number): Promise<{ key: string; movementId: string; tries: number }> {
  const key = randomUUID();
  for (let tries = 1; Date.now() < deadline; tries++) {
    try {
      const r = await c.json<{ movementId?: string }>("POST", url, body, { "idempotency-key": key });
      if (r.status === 201 && r.body.movementId) return { key, movementId: r.body.movementId, tries };
      if (r.status < 500) throw new Error(`refused: ${r.status} ${JSON.stringify(r.body)}`);
    } catch (error) {
      if ((error as Error).message.startsWith("refused")) throw error;
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`write with key ${key} was never acknowledged`);
}

describe("faults", () => {
  it("loses no acknowledged write and doubles none when the database stops and comes back under load", async () => {
    const c = await volunteer();
    const drive = await db("drives").where({ slug: "larkhollow-winter-2026" }).first();
    const point = await db("drop_points").where({ drive_id: drive.id, active: true }).first();
    const haul = await c.json<{ id: string }>("POST", `/api/drives/${drive.id}/hauls`, { dropPointId: point.id, bags: 4 }, { "idempotency-key": randomUUID() });
    expect(haul.status).toBe(201);
    expect((await c.json("POST", `/api/drives/${drive.id}/sorts`, { haulIds: [haul.body.id], good: 500 }, { "idempotency-key": randomUUID() })).status).toBe(201);
    const washedBefore = Number((await db("stage_balances").where({ drive_id: drive.id, stage: "washed" }).whereNull("drop_point_id").whereNull("heater_unit_id").first())?.quantity ?? 0);
    const since = new Date();

    const deadline = Date.now() + 60_000;
    const acked: { key: string; movementId: string; tries: number }[] = [];
    // Each writer keeps writing until the database has been back for a few of its
    // writes (at least 12 each), so the outage always falls in the middle of the load.
    let restarted = false;
    const writers = Array.from({ length: 3 }, async () => {
      let afterRestart = 0;
      for (let i = 0; i < 12 || afterRestart < 4; i++) {
        acked.push(await writeUntilAcknowledged(c, `/api/drives/${drive.id}/processing`, { from: "good", to: "washed", quantity: 1 }, deadline));
        if (restarted) afterRestart += 1;
        await new Promise((r) => setTimeout(r, 100));
      }
    });
    await new Promise((r) => setTimeout(r, 1_000));
    stopClusterAt(stack.cluster!.dataDir);
    const down = await fetch(`${appUrl}/api/health`);
    expect(down.status).toBe(503);
    await new Promise((r) => setTimeout(r, 3_000));
    startClusterAt(stack.cluster!.dataDir, ports.pg);
    restarted = true;
    await Promise.all(writers);

    expect(acked.length).toBeGreaterThanOrEqual(36);
    expect(acked.some((a) => a.tries > 1), "some writes were retried through the outage").toBe(true);
    expect(new Set(acked.map((a) => a.movementId)).size).toBe(acked.length);
    const lines: { movement_id: string; n: string | number }[] = await db("ledger_lines")
      .select("movement_id")
      .count({ n: "*" })
      .where({ drive_id: drive.id, from_stage: "good", to_stage: "washed" })
      .andWhere("recorded_at", ">=", since)
      .groupBy("movement_id");
    // Every acknowledged write is there once; nothing else was written.
    expect(lines.map((l) => String(l.movement_id)).sort()).toEqual(acked.map((a) => a.movementId).sort());
    expect(lines.every((l) => Number(l.n) === 1)).toBe(true);
    const washed = Number((await db("stage_balances").where({ drive_id: drive.id, stage: "washed" }).whereNull("drop_point_id").whereNull("heater_unit_id").first()).quantity);
    expect(washed - washedBefore).toBe(acked.length);
    expect((await fetch(`${appUrl}/api/health`)).status).toBe(200);
    const stock = await c.json<{ stages: { washed: number } }>("GET", `/api/drives/${drive.id}/stock`);
    expect(stock.body.stages.washed).toBe(washed);
  }, 120_000);

  it("queues a pledge's e-mail while the mail service is down and delivers it when it is back", async () => {
    const mailDir = path.join(runDir, "state", "mail");
    await stack.mail.close();
    const drive = await db("drives").where({ slug: "larkhollow-winter-2026" }).first();
    const point = await db("drop_points").where({ drive_id: drive.id, active: true }).first();
    const to = `pledger+${randomUUID().slice(0, 8)}@cantrove.test`;
    const res = await fetch(`${appUrl}/api/public/drives/${drive.slug}/pledges`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ dropPointId: point.id, name: "Wren", email: to, bags: 2, bringOn: "2026-12-12" }),
    });
    expect(res.status).toBe(201);
    const queued = await db("outbox").where({ to_address: to }).first();
    expect(queued.status).toBe("queued");
    expect(queued.last_error).toMatch(/ECONNREFUSED|connect/i);

    const mail: MailFake = await startMailFake({ dir: mailDir, smtpPort: ports.smtp, apiPort: ports.mailApi });
    stack.mail = mail;
    {
      // The first retry is due 30 s after the failed attempt, as a job on the queue (pg-boss) that the app works.
      const deadline = Date.now() + 60_000;
      while (Date.now() < deadline && !readMail(mailDir).some((m) => m.to.includes(to))) await new Promise((r) => setTimeout(r, 500));
      const delivered = readMail(mailDir).filter((m) => m.to.includes(to));
      expect(delivered).toHaveLength(1);
      expect(delivered[0].subject).toContain("Your pledge");
      expect((await db("outbox").where({ to_address: to }).first()).status).toBe("sent");
      // It went by the job queue: the retry job for this e-mail ran and completed.
      const retries = await db.raw("select state from pgboss.job where name = 'mail-deliver' and data->>'outboxId' = ?", [String(queued.id)]);
      expect(retries.rows.map((r: { state: string }) => r.state)).toContain("completed");
    }
  }, 90_000);

  it("records no photo while the upload service is down, and a new attempt is taken once it is back", async () => {
    await stack.uploads.close();
    const organiser = new ApiClient(appUrl);
    expect(await organiser.signIn(DEMO.organiser)).toBe(200);
    const drive = await db("drives").where({ slug: "larkhollow-winter-2026" }).first();
    const point = await db("drop_points").where({ drive_id: drive.id }).first();
    const filesBefore = Number((await db("files").count({ n: "*" }).first())?.n);
    // What the browser's upload button does: ask the app for a signed URL, then PUT the file there.
    const attempt = async (): Promise<string> => {
      const res = await organiser.request("POST", "/api/uploadthing?actionType=upload&slug=dropPointPhoto", {
        files: [{ name: "porch.png", size: pngBytes().length, type: "image/png", lastModified: Date.now() }],
        input: { dropPointId: point.id },
      }, { "x-uploadthing-package": "@uploadthing/react", "x-uploadthing-version": "7.7.4" });
      const text = await res.text();
      if (!res.ok) return `presign refused: HTTP ${res.status} ${text.slice(0, 160)}`;
      const [signed] = JSON.parse(text) as { url: string }[];
      const form = new FormData();
      // A real PNG: the app refuses anything whose bytes are not a photo.
      form.set("file", new Blob([new Uint8Array(pngBytes())], { type: "image/png" }), "porch.png");
      try {
        const put = await fetch(signed.url, { method: "PUT", body: form, signal: AbortSignal.timeout(10_000) });
        return put.ok ? "uploaded" : `upload refused: HTTP ${put.status}`;
      } catch (error) {
        return `upload failed: ${(error as Error).cause ?? (error as Error).message}`;
      }
    };
    const down = await attempt();
    console.log(`[faults] upload while the service is down: ${down}`);
    expect(down).not.toBe("uploaded");
    await new Promise((r) => setTimeout(r, 500));
    expect(Number((await db("files").count({ n: "*" }).first())?.n)).toBe(filesBefore);

    // The same key the stack gave the app (derived from the run's secret, as in scripts/lib/stack.ts).
    const secret = readFileSync(path.join(runDir, "state", "nextauth-secret"), "utf8").trim();
    stack.uploads = await startUploadFake({ dir: path.join(runDir, "state", "uploads"), port: ports.upload, apiKey: `sk_local_${secret.slice(0, 24)}` });
    expect(await attempt()).toBe("uploaded");
    const deadline = Date.now() + 15_000;
    while (Date.now() < deadline && Number((await db("files").count({ n: "*" }).first())?.n) === filesBefore) await new Promise((r) => setTimeout(r, 250));
    expect(Number((await db("files").count({ n: "*" }).first())?.n)).toBe(filesBefore + 1);
  }, 60_000);
});
