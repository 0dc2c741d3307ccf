import path from "node:path";
import pg from "pg";
import { startCluster } from "./postgres";

// The database the backup and restore commands act on: DATABASE_URL when set,
// else the embedded server (started for the command if it is not running).
export async function withDatabase(root: string, work: (url: string) => Promise<void>): Promise<void> {
  if (process.env.DATABASE_URL) return work(process.env.DATABASE_URL);
  const port = Number(process.env.PGPORT ?? 54329);
  const url = `postgres://postgres@127.0.0.1:${port}/${process.env.PGDATABASE ?? "cantrove"}`;
  const probe = new pg.Client({ connectionString: url });
  const running = await probe.connect().then(
    () => true,
    () => false,
  );
  await probe.end().catch(() => undefined);
  if (running) return work(url);
  const cluster = startCluster(process.env.CANTROVE_PGDATA ?? path.join(root, ".pgdata"), port, () => undefined);
  try {
    await work(url);
  } finally {
    cluster.stop();
  }
}
