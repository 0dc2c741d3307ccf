import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { startStack, type Stack } from "./lib/stack";
import { buildIfStale } from "./lib/build";
import { assertPortsFree, waitForHealthy } from "./lib/wait";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../db/seeds/data/scenario";
import { serverCommand, stopServer } from "./lib/serve";

// `npm start`: the database, the local fakes, migrations, the demo seed (once),
// a build when the sources changed, and the production server. SIGINT or
// SIGTERM stops all of it, the database included.
const root = path.resolve(import.meta.dirname, "..");
const port = Number(process.env.PORT ?? 3000);
const num = (name: string, fallback: number) => Number(process.env[name] ?? fallback);

let stack: Stack | null = null;
let server: ChildProcess | null = null;
let stopping = false;

async function shutdown(code: number): Promise<never> {
  if (stopping) return new Promise(() => undefined);
  stopping = true;
  console.log("\nStopping Cantrove…");
  await stopServer(server, 8_000, true);
  try {
    await stack?.stop();
  } catch (error) {
    console.error("Could not stop PostgreSQL cleanly:", (error as Error).message);
  }
  console.log("Stopped.");
  process.exit(code);
}

process.on("SIGINT", () => void shutdown(0));
process.on("SIGTERM", () => void shutdown(0));

async function main() {
  const started = Date.now();
  await assertPortsFree({ app: port, smtp: num("SMTP_PORT", 2525), mailApi: num("MAIL_API_PORT", 8025), upload: num("UPLOAD_PORT", 8026) }, "choose others with PORT, SMTP_PORT, MAIL_API_PORT and UPLOAD_PORT");
  stack = await startStack({
    root,
    // Overridable so the tests can run a second, separate `npm start`.
    stateDir: process.env.CANTROVE_STATE_DIR ?? path.join(root, ".cantrove"),
    pgDataDir: process.env.CANTROVE_PGDATA ?? path.join(root, ".pgdata"),
    pgPort: num("PGPORT", 54329),
    databaseName: process.env.PGDATABASE ?? "cantrove",
    databaseUrl: process.env.DATABASE_URL,
    smtpPort: num("SMTP_PORT", 2525),
    mailApiPort: num("MAIL_API_PORT", 8025),
    uploadPort: num("UPLOAD_PORT", 8026),
    appPort: port,
    seed: "demo",
  });
  if (stopping) return;
  const env: NodeJS.ProcessEnv = { ...process.env, ...stack.env, NODE_ENV: "production" };
  buildIfStale(root, env);
  if (stopping) return;
  const child = spawn(...serverCommand(root, port), {
    cwd: root,
    env,
    stdio: ["ignore", "inherit", "inherit"],
  });
  server = child;
  child.once("exit", (code) => {
    if (!stopping) {
      console.error(`The app server stopped unexpectedly (exit ${code}).`);
      void shutdown(1);
    }
  });
  await waitForHealthy(`http://127.0.0.1:${port}/api/health`, 60_000);
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  console.log(`
Cantrove is running at http://127.0.0.1:${port}  (ready in ${seconds} s)

Demo accounts (password: ${DEMO_PASSWORD})
${DEMO_PEOPLE.map((p) => `  ${p.email.padEnd(28)} ${p.role.padEnd(10)} ${p.group === "demo" ? "Larkhollow Warm Rooms Circle" : "Brindle Quay Fixers"}`).join("\n")}

Sent mail is captured locally: sign in as the organiser and open "Sent mail".
Press Ctrl+C to stop everything (the database too).
`);
}

main().catch(async (error) => {
  console.error(`Cantrove could not start: ${(error as Error).message}`);
  await shutdown(1);
});
