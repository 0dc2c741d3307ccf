import path from "node:path";

/** The command that serves the built app (server.mjs: Next's handler behind node:http, see there why). */
export function serverCommand(root: string, port: number, host = "127.0.0.1"): [string, string[]] {
  return [process.execPath, [path.join(root, "server.mjs"), "-H", host, "-p", String(port)]];
}
