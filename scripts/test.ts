import { spawn, type ChildProcess } from "node:child_process";
import { mkdirSync, mkdtempSync, readFileSync, rmSync, chmodSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { startStack, type Stack } from "./lib/stack";
import { buildIfStale } from "./lib/build";
import { assertPortsFree, waitForHealthy } from "./lib/wait";
import { serverCommand, stopServer } from "./lib/serve";

// `npm test`: a throwaway PostgreSQL and fakes on their own ports, the built
// app, then vitest (unit, hooks, integration, e2e). Ends with "N passed, N failed".
const root = path.resolve(import.meta.dirname, "..");
// CANTROVE_TEST_PORT_BASE moves every port at once, so two checkouts can test side by side.
// All below 32768, outside the ports Linux hands to outgoing connections.
const base = Number(process.env.CANTROVE_TEST_PORT_BASE ?? 0);
const ports = { pg: 25439 + base, smtp: 2535 + base, mailApi: 8035 + base, upload: 8036 + base, app: 3100 + base };
// Under the system temp folder rather than the checkout: PostgreSQL runs as
// the `postgres` user, which may not be allowed into the checkout's parents.
const runDir = (() => {
  const dir = mkdtempSync(path.join(os.tmpdir(), "cantrove-test-"));
  chmodSync(dir, 0o755);
  return dir;
})();

let stack: Stack | null = null;
let server: ChildProcess | null = null;

async function cleanup() {
  await stopServer(server);
  await stack?.stop().catch((e) => console.error("stop failed:", e));
  rmSync(runDir, { recursive: true, force: true });
}

function summary(): { passed: number; failed: number } {
  try {
    const report = JSON.parse(readFileSync(path.join(root, ".test-results/vitest.json"), "utf8"));
    return { passed: report.numPassedTests ?? 0, failed: (report.numFailedTests ?? 0) + (report.numRuntimeErrors ?? 0) };
  } catch {
    return { passed: 0, failed: 1 };
  }
}

async function main(): Promise<number> {
  const started = Date.now();
  await assertPortsFree(ports, "move every port with CANTROVE_TEST_PORT_BASE");
  stack = await startStack({
    root,
    stateDir: path.join(runDir, "state"),
    pgDataDir: path.join(runDir, "pgdata"),
    pgPort: ports.pg,
    databaseName: "cantrove_test",
    smtpPort: ports.smtp,
    mailApiPort: ports.mailApi,
    uploadPort: ports.upload,
    appPort: ports.app,
    seed: "demo",
    log: (line) => console.log(`[stack] ${line}`),
  });
  // NOTIFY_SCHEDULE=off: the notification tests run the sweep at chosen moments (lib/notify/sweep.ts).
  const env: NodeJS.ProcessEnv = { ...process.env, ...stack.env, NODE_ENV: "production", TRUSTED_PROXY_HOPS: "1", NOTIFY_SCHEDULE: "off" };
  buildIfStale(root, env, (line) => console.log(`[build] ${line}`));
  server = spawn(...serverCommand(root, ports.app), {
    cwd: root,
    env,
    stdio: ["ignore", "ignore", "inherit"],
  });
  await waitForHealthy(`http://127.0.0.1:${ports.app}/api/health`, 60_000);
  console.log(`[stack] ready in ${((Date.now() - started) / 1000).toFixed(1)} s`);

  mkdirSync(path.join(root, ".test-results"), { recursive: true });
  // Asynchronous on purpose: the mail and upload fakes live in this process
  // and must keep answering while vitest runs.
  const vitest = spawn(
    path.join(root, "node_modules/.bin/vitest"),
    ["run", "--reporter=default", "--reporter=json", "--outputFile.json=.test-results/vitest.json", ...process.argv.slice(2)],
    {
      cwd: root,
      stdio: "inherit",
      env: {
        ...env,
        NODE_ENV: "test" as const,
        // Knex loads the TypeScript migrations with Node's own import().
        NODE_OPTIONS: `${process.env.NODE_OPTIONS ?? ""} --import tsx`.trim(),
        CANTROVE_APP_URL: `http://127.0.0.1:${ports.app}`,
        CANTROVE_RUN_DIR: runDir,
        CANTROVE_TEST_PORTS: JSON.stringify(ports),
      },
    },
  );
  const status = await new Promise<number | null>((resolve) => vitest.once("exit", (code) => resolve(code)));
  const { passed, failed } = summary();
  console.log(`\nTotal time ${((Date.now() - started) / 1000).toFixed(0)} s`);
  console.log(`${passed} passed, ${failed} failed`);
  return status === 0 && failed === 0 ? 0 : 1;
}

let code = 1;
try {
  code = await main();
} catch (error) {
  console.error(`The test run could not start: ${(error as Error).stack ?? error}`);
  console.log("0 passed, 1 failed");
} finally {
  await cleanup();
}
process.exit(code);
