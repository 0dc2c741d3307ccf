import { spawn, spawnSync, execFileSync, type ChildProcess } from "node:child_process";
import { existsSync, mkdirSync, writeFileSync, chmodSync, rmSync } from "node:fs";
import path from "node:path";
import { startStack, type Stack } from "./stack";
import { asPostgres, ensurePostgresInstalled, ownByPostgres, startClusterAt, stopClusterAt } from "./postgres";
import { serverCommand, stopServer } from "./serve";
import { waitForHealthy } from "./wait";

// Cantrove past one machine, on this one: a PostgreSQL primary, a streaming
// hot standby made from it with pg_basebackup, PgBouncer (transaction mode) in
// front of the primary, N app servers (server.mjs, the built app) and HAProxy
// balancing them with health checks on /api/health. `npm run cluster` and the
// drills (scripts/cluster-drills.ts, tests/integration/cluster-drills.test.ts)
// start it through startAppCluster.

export interface ClusterPorts {
  primary: number;
  standby: number;
  bouncer: number;
  smtp: number;
  mailApi: number;
  upload: number;
  balancer: number;
  apps: number[];
}

export interface ClusterOptions {
  root: string;
  runDir: string; // pgdata, configs, logs; must be enterable by the postgres user
  ports: ClusterPorts;
  databaseName?: string;
  log?: (line: string) => void;
  /** Extra environment for the app servers (READ_CACHE_MS, probe intervals…). */
  appEnv?: Record<string, string>;
}

export interface AppCluster {
  url: string;
  ports: ClusterPorts;
  stack: Stack;
  databaseName: string;
  primaryDir: string;
  standbyDir: string;
  /** Direct URLs (not through the pooler). */
  primaryUrl: string;
  standbyUrl: string;
  bouncerUrl: string;
  appUrl: (i: number) => string;
  appEnv: () => NodeJS.ProcessEnv;
  startApp: (i: number, env?: NodeJS.ProcessEnv) => Promise<void>;
  killApp: (i: number, signal?: NodeJS.Signals) => Promise<void>;
  stopStandby: () => void;
  startStandby: () => void;
  /** Stops the primary (fast shutdown: the standby receives all WAL first), promotes the standby and points PgBouncer at it. */
  failOver: () => Promise<void>;
  /** The app servers' environment after failOver: the promoted standby is the primary, no replica. */
  promotedEnv: () => NodeJS.ProcessEnv;
  stop: () => Promise<void>;
}

const APT = (pkg: string, binary: string, log: (s: string) => void) => {
  if (existsSync(binary)) return;
  log(`${binary} not found: installing Debian's ${pkg} package…`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  execFileSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  execFileSync("apt-get", ["install", "-y", "-qq", "--no-install-recommends", pkg], { stdio: "inherit", env });
  if (!existsSync(binary)) throw new Error(`apt-get installed ${pkg} but ${binary} is still missing`);
};

export function ensureClusterTools(log: (s: string) => void = console.log): void {
  ensurePostgresInstalled(log);
  APT("pgbouncer", "/usr/sbin/pgbouncer", log);
  APT("haproxy", "/usr/sbin/haproxy", log);
}

const isRoot = () => process.getuid?.() === 0;

/** Runs a long-lived program as the postgres user when we are root (PgBouncer refuses root). */
function spawnAsPostgres(cmd: string, args: string[]): ChildProcess {
  const [c, a] = isRoot() ? ["setpriv", ["--reuid=postgres", "--regid=postgres", "--init-groups", "--", cmd, ...args]] : [cmd, args];
  return spawn(c, a as string[], { stdio: ["ignore", "ignore", "pipe"] }).once("error", () => undefined);
}

function writeConfig(file: string, text: string): void {
  writeFileSync(file, text);
  chmodSync(file, 0o644);
}

async function waitForPort(port: number, timeoutMs: number): Promise<void> {
  const net = await import("node:net");
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const ok = await new Promise<boolean>((resolve) => {
      const s = net.connect(port, "127.0.0.1", () => (s.end(), resolve(true)));
      s.once("error", () => resolve(false));
    });
    if (ok) return;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`nothing listens on 127.0.0.1:${port} after ${timeoutMs / 1000} s`);
}

export function pgbouncerConfig(o: { port: number; primaryPort: number; database: string; dir: string }): string {
  // Pool sizes: README "How it scales". Transaction mode: a server connection is
  // lent for one transaction, so nothing may rely on session state (see there).
  return `[databases]
${o.database} = host=127.0.0.1 port=${o.primaryPort} dbname=${o.database} user=postgres

[pgbouncer]
listen_addr = 127.0.0.1
listen_port = ${o.port}
unix_socket_dir =
auth_type = trust
auth_file = ${path.join(o.dir, "userlist.txt")}
pool_mode = transaction
max_client_conn = 400
default_pool_size = 20
reserve_pool_size = 5
server_reset_query =
ignore_startup_parameters = extra_float_digits
server_connect_timeout = 3
query_wait_timeout = 10
log_connections = 0
log_disconnections = 0
`;
}

export function haproxyConfig(o: { port: number; apps: number[] }): string {
  // Health: /api/health every 500 ms, out after 2 failures, back after 2 passes.
  // A request that could not reach a server (refused, or answered with nothing)
  // is sent again to the other: retry-on conn-failure empty-response. Writes
  // carry an Idempotency-Key where a retry must not count twice (CONTRACT.md).
  return `global
  maxconn 1000

defaults
  mode http
  timeout connect 2s
  timeout client 30s
  timeout server 30s
  retries 3
  option redispatch 1
  retry-on conn-failure empty-response

frontend cantrove
  bind 127.0.0.1:${o.port}
  option forwardfor
  default_backend apps

backend apps
  balance roundrobin
  option httpchk GET /api/health
  http-check expect status 200
  default-server check inter 500 fall 2 rise 2 on-marked-down shutdown-sessions
${o.apps.map((p, i) => `  server app${i + 1} 127.0.0.1:${p}`).join("\n")}
`;
}

export async function startAppCluster(opts: ClusterOptions): Promise<AppCluster> {
  const log = opts.log ?? console.log;
  const { root, runDir, ports } = opts;
  const databaseName = opts.databaseName ?? "cantrove";
  ensureClusterTools(log);
  mkdirSync(runDir, { recursive: true });
  chmodSync(runDir, 0o755);
  const primaryDir = path.join(runDir, "primary");
  const standbyDir = path.join(runDir, "standby");
  const url = `http://127.0.0.1:${ports.balancer}`;
  const children: ChildProcess[] = [];
  const apps: (ChildProcess | null)[] = ports.apps.map(() => null);
  let haproxy: ChildProcess | null = null;
  let bouncer: ChildProcess | null = null;
  let standbyRunning = false;

  const stack = await startStack({
    root,
    stateDir: path.join(runDir, "state"),
    pgDataDir: primaryDir,
    pgPort: ports.primary,
    databaseName,
    smtpPort: ports.smtp,
    mailApiPort: ports.mailApi,
    uploadPort: ports.upload,
    appPort: ports.balancer,
    seed: "demo",
    log,
  });
  const primaryUrl = `postgres://postgres@127.0.0.1:${ports.primary}/${databaseName}`;
  const standbyUrl = `postgres://postgres@127.0.0.1:${ports.standby}/${databaseName}`;
  const bouncerUrl = `postgres://postgres@127.0.0.1:${ports.bouncer}/${databaseName}`;

  const stopAll = async () => {
    haproxy?.kill("SIGTERM");
    await Promise.all(apps.map((a) => stopServer(a, 5_000, true)));
    bouncer?.kill("SIGTERM");
    for (const c of children) if (c.exitCode === null) c.kill("SIGKILL");
    if (standbyRunning) {
      try {
        stopClusterAt(standbyDir);
      } catch (e) {
        log(`standby stop: ${(e as Error).message}`);
      }
    }
    await stack.stop().catch((e) => log(`stop: ${(e as Error).message}`));
  };

  try {
    // The standby: a copy of the primary taken while it runs, set to follow it (-R writes
    // primary_conninfo and standby.signal). initdb --auth=trust allows replication from loopback.
    log(`Making the hot standby with pg_basebackup (port ${ports.standby})…`);
    rmSync(standbyDir, { recursive: true, force: true });
    mkdirSync(standbyDir, { recursive: true });
    ownByPostgres(standbyDir);
    const bin = ensurePostgresInstalled(log);
    asPostgres(bin, "pg_basebackup", ["-h", "127.0.0.1", "-p", String(ports.primary), "-U", "postgres", "-D", standbyDir, "-R", "-X", "stream", "-c", "fast"]);
    startClusterAt(standbyDir, ports.standby);
    standbyRunning = true;

    log(`Starting PgBouncer on 127.0.0.1:${ports.bouncer} (transaction mode)…`);
    const confDir = path.join(runDir, "conf");
    mkdirSync(confDir, { recursive: true });
    chmodSync(confDir, 0o755);
    writeConfig(path.join(confDir, "userlist.txt"), `"postgres" ""\n`);
    writeConfig(path.join(confDir, "pgbouncer.ini"), pgbouncerConfig({ port: ports.bouncer, primaryPort: ports.primary, database: databaseName, dir: confDir }));
    bouncer = spawnAsPostgres("/usr/sbin/pgbouncer", [path.join(confDir, "pgbouncer.ini")]);
    bouncer.stderr?.on("data", (d) => {
      const text = String(d);
      if (/FATAL|ERROR/.test(text)) log(`[pgbouncer] ${text.trim()}`);
    });
    children.push(bouncer);
    await waitForPort(ports.bouncer, 10_000);
  } catch (error) {
    await stopAll();
    throw error;
  }

  const appEnv = (): NodeJS.ProcessEnv => ({
    ...process.env,
    ...stack.env,
    NODE_ENV: "production",
    // The balancer appends the client's address to X-Forwarded-For: one trusted hop.
    TRUSTED_PROXY_HOPS: "1",
    DATABASE_URL: bouncerUrl,
    // LISTEN keeps session state: a direct connection, never through the transaction pooler.
    DATABASE_LISTEN_URL: primaryUrl,
    DATABASE_READ_URL: standbyUrl,
    DB_POOL_MAX: process.env.DB_POOL_MAX ?? "10",
    ...opts.appEnv,
  });

  const startApp = async (i: number, env: NodeJS.ProcessEnv = appEnv()) => {
    const child = spawn(...serverCommand(root, ports.apps[i]), { cwd: root, env, stdio: ["ignore", "ignore", "pipe"] });
    child.stderr?.on("data", (d) => {
      const text = String(d).trim();
      if (text && !/ExperimentalWarning|read-cache listener lost/.test(text)) log(`[app${i + 1}] ${text.slice(0, 400)}`);
    });
    apps[i] = child;
    await waitForHealthy(`http://127.0.0.1:${ports.apps[i]}/api/health`, 90_000);
  };

  try {
    log(`Starting ${ports.apps.length} app servers on ${ports.apps.join(", ")}…`);
    // One after another: on a small machine two cold starts at once take longer than both in turn.
    for (let i = 0; i < ports.apps.length; i++) await startApp(i);
    const confDir = path.join(runDir, "conf");
    writeConfig(path.join(confDir, "haproxy.cfg"), haproxyConfig({ port: ports.balancer, apps: ports.apps }));
    const check = spawnSync("/usr/sbin/haproxy", ["-c", "-q", "-f", path.join(confDir, "haproxy.cfg")], { encoding: "utf8" });
    if (check.status !== 0) throw new Error(`haproxy refused its configuration:\n${check.stdout}${check.stderr}`);
    log(`Starting HAProxy on ${url}…`);
    haproxy = spawn("/usr/sbin/haproxy", ["-db", "-f", path.join(confDir, "haproxy.cfg")], { stdio: ["ignore", "ignore", "pipe"] });
    haproxy.stderr?.on("data", (d) => {
      const text = String(d).trim();
      if (/ALERT|is DOWN|is UP/.test(text)) log(`[haproxy] ${text.slice(0, 300)}`);
    });
    children.push(haproxy);
    await waitForHealthy(`${url}/api/health`, 15_000);
  } catch (error) {
    await stopAll();
    throw error;
  }

  return {
    url,
    ports,
    stack,
    databaseName,
    primaryDir,
    standbyDir,
    primaryUrl,
    standbyUrl,
    bouncerUrl,
    appUrl: (i) => `http://127.0.0.1:${ports.apps[i]}`,
    appEnv,
    startApp,
    killApp: async (i, signal = "SIGKILL") => {
      const child = apps[i];
      if (!child || child.exitCode !== null) return;
      const exited = new Promise((r) => child.once("exit", r));
      child.kill(signal);
      await exited;
    },
    stopStandby: () => {
      stopClusterAt(standbyDir);
      standbyRunning = false;
    },
    startStandby: () => {
      startClusterAt(standbyDir, ports.standby);
      standbyRunning = true;
    },
    failOver: async () => {
      stack.cluster?.stop();
      asPostgres(ensurePostgresInstalled(log), "pg_ctl", ["-D", standbyDir, "-w", "-t", "30", "promote"]);
      const confDir = path.join(runDir, "conf");
      writeConfig(path.join(confDir, "pgbouncer.ini"), pgbouncerConfig({ port: ports.bouncer, primaryPort: ports.standby, database: databaseName, dir: confDir }));
      bouncer?.kill("SIGHUP"); // PgBouncer rereads its configuration: new server connections go to the promoted standby
      await new Promise((r) => setTimeout(r, 500));
    },
    promotedEnv: () => {
      const env: NodeJS.ProcessEnv = { ...appEnv(), DATABASE_LISTEN_URL: standbyUrl };
      delete env.DATABASE_READ_URL;
      return env;
    },
    stop: stopAll,
  };
}
