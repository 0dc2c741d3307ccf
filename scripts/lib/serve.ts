import type { ChildProcess } from "node:child_process";
import path from "node:path";

/** The command that serves the built app (server.mjs: Next's handler behind node:http, see there why). */
export function serverCommand(root: string, port: number, host = "127.0.0.1"): [string, string[]] {
  return [process.execPath, [path.join(root, "server.mjs"), "-H", host, "-p", String(port)]];
}

/** Asks the app server to stop (SIGTERM) and waits for it up to `graceMs`; with `force`, a server still running then is killed. */
export async function stopServer(server: ChildProcess | null, graceMs = 5_000, force = false): Promise<void> {
  if (!server || server.exitCode !== null) return;
  const exited = new Promise((resolve) => server.once("exit", resolve));
  server.kill("SIGTERM");
  await Promise.race([exited, new Promise((r) => setTimeout(r, graceMs))]);
  if (force && server.exitCode === null) server.kill("SIGKILL");
}
