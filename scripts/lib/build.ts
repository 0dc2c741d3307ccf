import { createHash } from "node:crypto";
import { existsSync, readFileSync, readdirSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { spawnSync } from "node:child_process";

// The build is redone only when something that goes into it changed: a hash
// of the sources and configs is kept next to the build.
const INPUTS = ["app", "components", "lib", "hooks", "public", "types", "instrumentation.ts", "proxy.ts", "next.config.mjs",
  "tailwind.config.ts", "postcss.config.mjs", "tsconfig.json", "package-lock.json", "knexfile.ts"];
const STAMP = ".next/cantrove-build-hash";

function walk(root: string, file: string, hash: ReturnType<typeof createHash>): void {
  const full = path.join(root, file);
  if (!existsSync(full)) return;
  const stat = statSync(full);
  if (stat.isDirectory()) {
    for (const entry of readdirSync(full).sort()) walk(root, path.join(file, entry), hash);
  } else {
    hash.update(file);
    hash.update(readFileSync(full));
  }
}

// What the build reads from its environment: NEXT_PUBLIC_* is inlined, and
// CANTROVE_BENCH=1 adds the bench-only routes (*.bench.ts, next.config.mjs).
const BUILD_ENV = (k: string) => k.startsWith("NEXT_PUBLIC_") || k === "CANTROVE_BENCH";

export function sourceHash(root: string, env: NodeJS.ProcessEnv = process.env): string {
  const hash = createHash("sha256");
  for (const input of INPUTS) walk(root, input, hash);
  for (const [k, v] of Object.entries(env).sort()) if (BUILD_ENV(k)) hash.update(`${k}=${v}`);
  return hash.digest("hex");
}

export function buildIfStale(root: string, env: NodeJS.ProcessEnv, log: (s: string) => void = console.log): boolean {
  const wanted = sourceHash(root, env);
  const stampFile = path.join(root, STAMP);
  if (existsSync(path.join(root, ".next/BUILD_ID")) && existsSync(stampFile) && readFileSync(stampFile, "utf8") === wanted) {
    log("Build is up to date.");
    return false;
  }
  log("Building the app (next build)…");
  const result = spawnSync(path.join(root, "node_modules/.bin/next"), ["build"], {
    cwd: root,
    env: { ...env, NEXT_TELEMETRY_DISABLED: "1" },
    stdio: "inherit",
  });
  if (result.status !== 0) throw new Error(`next build failed (exit ${result.status})`);
  // Stamp what was hashed before the build: a file edited during the build
  // then counts as not built. (next build rewrites tsconfig.json only once;
  // the rewritten file is committed.)
  writeFileSync(stampFile, wanted);
  return true;
}
