import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { startAppCluster, type AppCluster } from "@/scripts/lib/cluster";
import {
  drillContext, drillFailOver, drillFreshAcrossServers, drillKillOneServer, drillReadsOnStandby, drillReplicaDown, type DrillContext,
} from "@/scripts/lib/cluster-drills";

// The cluster drills, small (README "How it scales"; full size: npm run cluster -- --drill).
// Its own primary, standby (pg_basebackup, streaming), PgBouncer, two app servers
// (the build npm test made) and HAProxy, on ports of its own: fixed and below
// Linux's ephemeral range (32768–60999), which the kernel hands to outgoing
// connections; a fixed port inside it was once taken by one (EADDRINUSE in CI).
const base = Number(process.env.CANTROVE_TEST_PORT_BASE ?? 0);
const ports = { primary: 26000 + base, standby: 26001 + base, bouncer: 26002 + base, smtp: 26003 + base, mailApi: 26004 + base, upload: 26005 + base, balancer: 4000 + base, apps: [4001 + base, 4002 + base] };
const root = path.resolve(import.meta.dirname, "../..");
const runDir = mkdtempSync(path.join(os.tmpdir(), "cantrove-drill-"));
let cluster: AppCluster;
let ctx: DrillContext;
const saved = { ...process.env };

describe.sequential("cluster drills (two app servers, a pooler and a hot standby)", () => {
  beforeAll(async () => {
    cluster = await startAppCluster({ root, runDir, ports, databaseName: "cantrove_drill", log: () => undefined });
    ctx = await drillContext(cluster);
  }, 150_000);

  afterAll(async () => {
    await cluster?.stop();
    rmSync(runDir, { recursive: true, force: true });
    process.env = saved; // startStack wrote the drill cluster's settings into this process
  }, 60_000);

  it("(1) a write through server A is on server B's next read, B's 2 s cache notwithstanding", async () => {
    const r = await drillFreshAcrossServers(ctx, 5);
    expect(r.stale).toBe(0);
  }, 30_000);

  it("(2) public reads are answered by the standby", async () => {
    const r = await drillReadsOnStandby(ctx, 20);
    expect(r.standbyIsInRecovery).toBe(true);
    expect(r.standbySessionsThatRanPublicReads).toBeGreaterThan(0);
  }, 30_000);

  it("(3) one app server killed mid-load: under 1 % errors, no acknowledged write lost", async () => {
    const r = await drillKillOneServer(ctx, 8, 4);
    expect(r.acknowledged).toBeGreaterThan(5);
    expect(r.acknowledgedFound).toBe(r.acknowledged);
    expect(r.errorRate).toBeLessThan(0.01);
  }, 120_000);

  it("(5) standby down: the public pages still answer, from the primary", async () => {
    const r = await drillReplicaDown(ctx, 12);
    expect(r.ok).toBe(r.reads);
  }, 60_000);

  it("(4) primary stopped, standby promoted: every acknowledged write is there and writes go on", async () => {
    const r = await drillFailOver(ctx);
    expect(r.promotedIsPrimary).toBe(true);
    expect(r.foundOnPromoted).toBe(r.acknowledged);
    expect(r.writeAfterFailOver).toBe(201);
  }, 150_000);
});
