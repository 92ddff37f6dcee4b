// Starts what the app needs on this machine: PostgreSQL (unless DATABASE_URL is set), the
// mail fake (unless SMTP_URL is set), the S3 fake (unless S3_ENDPOINT is set) and the payment
// fake (unless STRIPE_SECRET_KEY is set).
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import net from "node:net";
import path from "node:path";
import { ensureDatabase, startPostgres } from "@/db/server";
import { migrateDatabase } from "@/db/migrate";
import { startMailFake } from "./mail-fake";
import { startS3Fake } from "./s3-fake";
import { startStripeFake } from "./stripe-fake";

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

function persistentSecret(root: string): string {
  const file = path.join(root, ".data", "auth-secret");
  if (existsSync(file)) return readFileSync(file, "utf8").trim();
  mkdirSync(path.dirname(file), { recursive: true });
  const secret = randomBytes(32).toString("hex");
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

export type Services = { env: Record<string, string>; databaseUrl: string; stop: () => Promise<void> };

export async function startServices(opts: {
  root: string; appPort: number; database: string; fresh?: boolean; secret?: string; log?: (m: string) => void;
  /** The test runner's own fast, non-durable cluster (see startPostgres). */
  throwawayDatabase?: boolean;
}): Promise<Services> {
  const log = opts.log ?? console.log;
  const stops: (() => Promise<void> | void)[] = [];
  const env: Record<string, string> = {};
  let databaseUrl = process.env.DATABASE_URL ?? "";
  try {
    if (!databaseUrl) {
      const pgPort = opts.throwawayDatabase ? await freePort() : process.env.PGPORT ? Number(process.env.PGPORT) : undefined;
      const server = await startPostgres({ root: opts.root, port: pgPort, throwaway: opts.throwawayDatabase, log: (m) => log(`[postgres] ${m}`) });
      stops.push(server.stop);
      await ensureDatabase(server.url("postgres"), opts.database, { fresh: opts.fresh });
      databaseUrl = server.url(opts.database);
    }
    env.DATABASE_URL = databaseUrl;
    log("[db] applying migrations");
    await migrateDatabase(databaseUrl);

    if (process.env.SMTP_URL) {
      env.SMTP_URL = process.env.SMTP_URL;
    } else {
      const mail = await startMailFake({ port: await freePort(), databaseUrl });
      stops.push(mail.stop);
      env.SMTP_URL = mail.url;
      env.TRAINYARD_MAIL_FAKE = "1";
      log(`[mail] local outbox listening at ${mail.url}`);
    }

    if (process.env.S3_ENDPOINT) {
      env.S3_ENDPOINT = process.env.S3_ENDPOINT;
    } else {
      const bucket = process.env.S3_BUCKET ?? "trainyard-uploads";
      const s3 = await startS3Fake({ port: await freePort(), directory: path.join(opts.root, ".data", `s3-${opts.database}`), bucket });
      stops.push(s3.stop);
      env.S3_ENDPOINT = s3.endpoint;
      env.S3_BUCKET = bucket;
      env.S3_ACCESS_KEY_ID = "S3RVER";
      env.S3_SECRET_ACCESS_KEY = "S3RVER";
      log(`[s3] local store at ${s3.endpoint}`);
    }

    if (process.env.STRIPE_SECRET_KEY) {
      for (const k of ["STRIPE_SECRET_KEY", "STRIPE_WEBHOOK_SECRET", "STRIPE_API_HOST", "STRIPE_API_PORT", "STRIPE_API_PROTOCOL"]) if (process.env[k]) env[k] = process.env[k]!;
    } else {
      const stripe = await startStripeFake({ port: await freePort(), webhookUrl: `http://127.0.0.1:${opts.appPort}/api/v1/webhooks/stripe`, log });
      stops.push(stripe.stop);
      Object.assign(env, {
        STRIPE_SECRET_KEY: stripe.secretKey, STRIPE_WEBHOOK_SECRET: stripe.webhookSecret,
        STRIPE_API_HOST: stripe.host, STRIPE_API_PORT: String(stripe.port), STRIPE_API_PROTOCOL: "http",
      });
      log(`[stripe] local payment fake at ${stripe.url}`);
    }

    env.PORT = String(opts.appPort);
    env.BETTER_AUTH_URL = process.env.BETTER_AUTH_URL ?? `http://127.0.0.1:${opts.appPort}`;
    env.BETTER_AUTH_SECRET = process.env.BETTER_AUTH_SECRET ?? opts.secret ?? persistentSecret(opts.root);
  } catch (err) {
    for (const stop of stops.reverse()) await stop();
    throw err;
  }
  return {
    env, databaseUrl,
    stop: async () => { for (const stop of stops.reverse()) { try { await stop(); } catch { /* keep stopping */ } } },
  };
}
