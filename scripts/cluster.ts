import { mkdtempSync, rmSync, chmodSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { startAppCluster, type AppCluster } from "./lib/cluster";
import { buildIfStale } from "./lib/build";
import {
  drillContext, drillFailOver, drillFreshAcrossServers, drillKillOneServer, drillReadsOnStandby, drillReplicaDown, drillVerdicts, type DrillResults,
} from "./lib/cluster-drills";

// `npm run cluster [-- --drill]`: PostgreSQL primary + hot standby, PgBouncer,
// two app servers and HAProxy on this machine (scripts/lib/cluster.ts); prints
// the URL and runs until Ctrl+C. With --drill, runs the drills full size, prints
// what they measured and whether each passed, and stops (exit 1 when one failed). Ports: CLUSTER_PORT (the balancer, default 3010;
// the apps take the next two) and CLUSTER_PGPORT (primary, default 25532; the
// standby, PgBouncer, the mail and upload fakes take the next five).
const root = path.resolve(import.meta.dirname, "..");
const drill = process.argv.includes("--drill");
const web = Number(process.env.CLUSTER_PORT ?? 3010);
const pgp = Number(process.env.CLUSTER_PGPORT ?? 25532);
const ports = { balancer: web, apps: [web + 1, web + 2], primary: pgp, standby: pgp + 1, bouncer: pgp + 2, smtp: pgp + 3, mailApi: pgp + 4, upload: pgp + 5 };
const runDir = mkdtempSync(path.join(os.tmpdir(), "cantrove-cluster-"));
chmodSync(runDir, 0o755);

let cluster: AppCluster | null = null;
let stopping = false;
async function stop(code: number) {
  if (stopping) return;
  stopping = true;
  console.log("Stopping the cluster…");
  await cluster?.stop().catch((e) => console.error(e));
  rmSync(runDir, { recursive: true, force: true });
  process.exit(code);
}
process.once("SIGINT", () => void stop(0));
process.once("SIGTERM", () => void stop(0));

try {
  buildIfStale(root, { ...process.env, NODE_ENV: "production" }, (l) => console.log(`[build] ${l}`));
  cluster = await startAppCluster({ root, runDir, ports, log: (l) => console.log(`[cluster] ${l}`) });
  console.log(`\nCantrove cluster ready: ${cluster.url}  (apps ${ports.apps.join(", ")}, primary ${ports.primary}, standby ${ports.standby}, PgBouncer ${ports.bouncer})`);
  if (!drill) {
    console.log("Ctrl+C stops everything.");
  } else {
    const ctx = await drillContext(cluster);
    const results: DrillResults = {
      freshAcrossServers: await drillFreshAcrossServers(ctx, 30),
      readsOnStandby: await drillReadsOnStandby(ctx, 40),
      killOneServer: await drillKillOneServer(ctx, 30, 8),
      replicaDown: await drillReplicaDown(ctx, 40),
      failOver: await drillFailOver(ctx),
    };
    console.log(JSON.stringify(results, null, 2));
    const verdicts = drillVerdicts(results);
    for (const v of verdicts) console.log(`${v.passed ? "PASS" : "FAIL"}  ${v.drill}: ${v.measured}`);
    const failed = verdicts.filter((v) => !v.passed).length;
    console.log(`${verdicts.length - failed} passed, ${failed} failed`);
    await stop(failed ? 1 : 0);
  }
} catch (error) {
  console.error(`The cluster could not start or a drill broke: ${(error as Error).stack ?? error}`);
  await stop(1);
}
