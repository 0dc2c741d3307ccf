import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { randomBytes } from "node:crypto";
import path from "node:path";
import knex from "knex";
import { knexConfig } from "../../knexfile";
import { startCluster, ensureDatabase, type Cluster } from "./postgres";
import { startMailFake, type MailFake } from "../fakes/mail-fake";
import { startUploadFake, uploadToken, type UploadFake } from "../fakes/upload-fake";

// Everything Cantrove needs around the app: the database, the mail and upload
// fakes, migrations and (optionally) the demo seed. Used by `npm start`, the
// test runner and the benchmark, each with its own ports and folders.
export interface StackOptions {
  root: string;
  stateDir: string; // mail, uploads, secret
  pgDataDir: string;
  pgPort: number;
  databaseName: string;
  databaseUrl?: string; // when set, no embedded PostgreSQL is started
  smtpPort: number;
  mailApiPort: number;
  uploadPort: number;
  appPort: number;
  seed: "demo" | "none";
  log?: (line: string) => void;
}

export interface Stack {
  env: Record<string, string>;
  cluster: Cluster | null;
  mail: MailFake;
  uploads: UploadFake;
  seeded: boolean;
  stop: () => Promise<void>;
}

function persistentSecret(stateDir: string): string {
  const file = path.join(stateDir, "nextauth-secret");
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString("hex"), { mode: 0o600 });
  return readFileSync(file, "utf8").trim();
}

export async function startStack(opts: StackOptions): Promise<Stack> {
  const log = opts.log ?? console.log;
  mkdirSync(opts.stateDir, { recursive: true });
  let cluster: Cluster | null = null;
  let databaseUrl = opts.databaseUrl;
  if (!databaseUrl) {
    log(`Starting PostgreSQL on 127.0.0.1:${opts.pgPort} (data in ${path.relative(opts.root, opts.pgDataDir) || opts.pgDataDir})…`);
    cluster = startCluster(opts.pgDataDir, opts.pgPort, log);
    await ensureDatabase(cluster.url("postgres"), opts.databaseName);
    databaseUrl = cluster.url(opts.databaseName);
  }
  const apiKey = `sk_local_${persistentSecret(opts.stateDir).slice(0, 24)}`;
  const mail = await startMailFake({ dir: path.join(opts.stateDir, "mail"), smtpPort: opts.smtpPort, apiPort: opts.mailApiPort });
  // UPLOAD_ORIGIN: serve files under another host name (another site from the app), as in production.
  const uploadOrigin = process.env.UPLOAD_ORIGIN || undefined;
  const uploads = await startUploadFake({ dir: path.join(opts.stateDir, "uploads"), port: opts.uploadPort, apiKey, fileOrigin: uploadOrigin });
  const appUrl = `http://127.0.0.1:${opts.appPort}`;
  const env: Record<string, string> = {
    DATABASE_URL: databaseUrl,
    NEXTAUTH_SECRET: persistentSecret(opts.stateDir),
    NEXTAUTH_URL: appUrl,
    APP_URL: appUrl,
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(opts.smtpPort),
    MAIL_API_URL: `http://127.0.0.1:${opts.mailApiPort}`,
    UPLOADTHING_TOKEN: uploadToken(apiKey, "cantrove-local"),
    UPLOADTHING_INGEST_URL: uploads.origin,
    UPLOADTHING_API_URL: uploads.origin,
    UPLOADTHING_IS_DEV: "false",
    UPLOADTHING_CALLBACK_URL: `${appUrl}/api/uploadthing`,
    ...(uploadOrigin ? { UPLOAD_ORIGIN: uploadOrigin } : {}),
    NEXT_TELEMETRY_DISABLED: "1",
  };
  for (const [k, v] of Object.entries(env)) process.env[k] = v;

  const db = knex(knexConfig(databaseUrl));
  let seeded = false;
  try {
    const [, applied] = await db.migrate.latest({ directory: path.join(opts.root, "db/migrations") });
    if (applied.length) log(`Applied ${applied.length} migration(s).`);
    if (opts.seed === "demo") {
      const row = await db("groups").count({ n: "*" }).first();
      if (Number(row?.n ?? 0) === 0) {
        log("Empty database: seeding the demo scenario…");
        await db.seed.run({ directory: path.join(opts.root, "db/seeds") });
        seeded = true;
      }
    }
  } finally {
    await db.destroy();
  }

  return {
    env,
    cluster,
    mail,
    uploads,
    seeded,
    stop: async () => {
      await mail.close().catch(() => undefined);
      await uploads.close().catch(() => undefined);
      cluster?.stop();
    },
  };
}
