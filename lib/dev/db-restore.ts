// npm run db:restore FILE [--yes] [--database NAME] — restore a backup made by db:backup.
// Asks first. The current database is renamed aside (never dropped); with no cluster yet
// (a new checkout, or a broken cluster moved away) a fresh one is created.
import path from "node:path";
import { createInterface } from "node:readline/promises";
import { fileURLToPath } from "node:url";
import { startPostgres } from "@/db/server";
import { restoreDatabase } from "./db-tools";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..", "..");
const args = process.argv.slice(2);
const yes = args.includes("--yes");
const dbFlag = args.indexOf("--database");
const file = args.find((a, i) => !a.startsWith("--") && i !== dbFlag + 1);
if (!file) {
  console.error("Usage: npm run db:restore -- FILE [--yes] [--database NAME]   (FILE from .data/backups/)");
  process.exit(2);
}

let stop = () => {};
let adminUrl: string;
let database: string;
if (process.env.DATABASE_URL) {
  const u = new URL(process.env.DATABASE_URL);
  database = dbFlag >= 0 ? args[dbFlag + 1] : u.pathname.slice(1);
  u.pathname = "/postgres";
  adminUrl = u.toString();
} else {
  const server = await startPostgres({ root, port: process.env.PGPORT ? Number(process.env.PGPORT) : undefined, log: (m) => console.log(`[postgres] ${m}`) });
  stop = server.stop;
  adminUrl = server.url("postgres");
  database = dbFlag >= 0 ? args[dbFlag + 1] : process.env.PGDATABASE ?? "trainyard";
}

try {
  const where = `${database} on ${new URL(adminUrl).host}`;
  if (!yes) {
    const rl = createInterface({ input: process.stdin, output: process.stdout });
    const answer = await rl.question(`Restore ${file} as ${where}? Stop the app first; the current database is kept under another name. Type "yes": `);
    rl.close();
    if (answer.trim().toLowerCase() !== "yes") {
      console.log("Nothing restored.");
      process.exit(1);
    }
  }
  const keptAs = await restoreDatabase({ adminUrl, database, file: path.resolve(file) });
  console.log(`Restored ${file} as ${where}.${keptAs ? ` The previous database is kept as ${keptAs} (drop it when you no longer need it).` : ""}`);
} catch (err) {
  console.error((err as Error).message);
  process.exitCode = 1;
} finally {
  stop();
}
