import "server-only";
// Limits for the app's own expensive and write routes, counted in PostgreSQL
// (rate-limiter-flexible's RateLimiterPostgres) so that every app instance shares one window.
// Keyed on the client address (see lib/http/forwarded.ts) and, when signed in, on the user.
import pg from "pg";
import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { AppError } from "@/lib/errors";

export type LimitName = "solve" | "write" | "upload";

/** Requests per minute. Generous enough for a club behind one address; a loop hits them fast. */
const PER_MINUTE: Record<LimitName, { address: number; user: number }> = {
  solve: { address: 240, user: 120 },
  write: { address: 300, user: 120 },
  upload: { address: 30, user: 10 },
};

export const rateLimitsEnabled = () => process.env.TRAINYARD_RATE_LIMIT !== "0";

type Limiters = { pool: pg.Pool; limiters: Map<string, RateLimiterPostgres> };
const globalForLimits = globalThis as unknown as { trainyardLimits?: Limiters };

function perMinute(name: LimitName, who: "address" | "user"): number {
  // TRAINYARD_LIMIT_SOLVE=10 sets both (the limit test uses small numbers to stay quick).
  const override = Number(process.env[`TRAINYARD_LIMIT_${name.toUpperCase()}`]);
  return Number.isFinite(override) && override > 0 ? override : PER_MINUTE[name][who];
}

function limiter(name: LimitName, who: "address" | "user"): RateLimiterPostgres {
  globalForLimits.trainyardLimits ??= (() => {
    const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 3 });
    pool.on("error", () => {}); // a dropped idle connection reconnects on the next query
    return { pool, limiters: new Map() };
  })();
  const { pool, limiters } = globalForLimits.trainyardLimits;
  const key = `${name}:${who}`;
  let l = limiters.get(key);
  if (!l) {
    // The table comes from the migrations (db/schema-security.ts), so no CREATE TABLE at run time.
    l = new RateLimiterPostgres({ storeClient: pool, storeType: "pool", tableName: "app_rate_limits", tableCreated: true, keyPrefix: key, points: perMinute(name, who), duration: 60 });
    limiters.set(key, l);
  }
  return l;
}

/** The client address the front server (lib/dev/serve.ts) put in X-Forwarded-For. */
export function requestAddress(request: Request): string {
  return request.headers.get("x-forwarded-for")?.split(",")[0]?.trim() || "unknown";
}

/** Count one request; 429 with Retry-After once the address or the user is over the limit. */
export async function consumeLimit(request: Request, name: LimitName, userId: string | null): Promise<void> {
  if (!rateLimitsEnabled()) return;
  try {
    await limiter(name, "address").consume(requestAddress(request));
    if (userId) await limiter(name, "user").consume(userId);
  } catch (err) {
    if (!(err instanceof RateLimiterRes)) throw err;
    const seconds = Math.max(1, Math.ceil(err.msBeforeNext / 1000));
    const e = new AppError("too_many_requests", `Too many requests. Try again in ${seconds} s.`);
    e.headers = { "retry-after": String(seconds) };
    throw e;
  }
}
