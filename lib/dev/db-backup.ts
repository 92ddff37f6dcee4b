// npm run db:backup — a pg_dump (custom format) of the project's database into .data/backups/.
//   DATABASE_URL set: that database; otherwise the checkout's own cluster (started if needed).
import path from "node:path";
import { fileURLToPath } from "node:url";
import { startPostgres } from "@/db/server";
import { backupDatabase } from "./db-tools";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..", "..");
const database = process.env.PGDATABASE ?? "trainyard";
let stop = () => {};
let url = process.env.DATABASE_URL;
if (!url) {
  const server = await startPostgres({ root, port: process.env.PGPORT ? Number(process.env.PGPORT) : undefined, log: () => {} });
  stop = server.stop;
  url = server.url(database);
}
try {
  const file = backupDatabase({ url, dir: path.join(root, ".data", "backups") });
  console.log(`Backup written: ${path.relative(process.cwd(), file)}`);
  console.log(`Restore it with: npm run db:restore ${path.relative(process.cwd(), file)}`);
} catch (err) {
  console.error((err as Error).message);
  process.exitCode = 1;
} finally {
  stop();
}
