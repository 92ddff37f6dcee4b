// One error type for the whole app; `toErrorResponse` turns it into JSON and hides internals.
export type ErrorCode =
  | "bad_request" | "unauthorized" | "forbidden" | "not_found" | "conflict" | "payload_too_large"
  | "unsupported_media_type" | "too_many_requests" | "unavailable" | "internal";

const STATUS: Record<ErrorCode, number> = {
  bad_request: 400, unauthorized: 401, forbidden: 403, not_found: 404, conflict: 409,
  payload_too_large: 413, unsupported_media_type: 415, too_many_requests: 429, unavailable: 503, internal: 500,
};

export class AppError extends Error {
  readonly code: string;
  readonly status: number;
  readonly fields?: Record<string, string[]>;
  /** Extra response headers (Retry-After on a 429). */
  headers?: Record<string, string>;

  /** `code` is "kind" or "kind:subject", e.g. "not_found:build", "forbidden:shop". */
  constructor(code: `${ErrorCode}` | `${ErrorCode}:${string}`, message: string, fields?: Record<string, string[]>) {
    super(message);
    this.code = code;
    this.status = STATUS[code.split(":")[0] as ErrorCode] ?? 500;
    this.fields = fields;
  }
}

export type ErrorBody = { error: { code: string; message: string; fields?: Record<string, string[]> } };

// PostgreSQL unreachable, restarting or shutting down (SQLSTATE classes 08 and 57P, or the
// driver's own connection errors): the client may retry, so 503 rather than 500.
const DB_DOWN_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT", "ENOTFOUND", "57P01", "57P02", "57P03", "53300"]);
const DB_DOWN_MESSAGES = /Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error|the database system is (starting up|shutting down)|terminating connection/i;

/** The error and its causes (drizzle, better-auth and pg wrap one another). */
function causes(err: unknown): { code?: unknown; message?: unknown }[] {
  const out: { code?: unknown; message?: unknown }[] = [];
  for (let e = err, i = 0; e && typeof e === "object" && i < 6; e = (e as { cause?: unknown }).cause, i++) {
    out.push(e as { code?: unknown; message?: unknown });
    for (const inner of (e as { errors?: unknown[] }).errors ?? []) if (inner && typeof inner === "object") out.push(inner as { code?: unknown });
  }
  return out;
}

export function isDatabaseDown(err: unknown): boolean {
  return causes(err).some((e) => (typeof e.code === "string" && (DB_DOWN_CODES.has(e.code) || e.code.startsWith("08")))
    || (typeof e.message === "string" && DB_DOWN_MESSAGES.test(e.message)));
}

export function errorBody(err: unknown): { status: number; body: ErrorBody } {
  if (err instanceof AppError) {
    return { status: err.status, body: { error: { code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) } } };
  }
  if (isDatabaseDown(err)) {
    console.error("database unavailable:", (err as Error)?.message);
    return { status: 503, body: { error: { code: "unavailable:database", message: "The database is not answering right now. Try again in a moment." } } };
  }
  console.error(err);
  return { status: 500, body: { error: { code: "internal", message: "Something went wrong on our side. Please try again." } } };
}

export function toErrorResponse(err: unknown): Response {
  const { status, body } = errorBody(err);
  const headers = err instanceof AppError && err.headers ? err.headers : status === 503 ? { "retry-after": "5" } : undefined;
  return Response.json(body, { status, headers });
}

type Issue = { path: readonly PropertyKey[]; message: string; code?: string; errors?: readonly (readonly Issue[])[] };

function collect(issues: readonly Issue[], prefix: readonly PropertyKey[], out: Record<string, string[]>): void {
  for (const issue of issues) {
    const path = [...prefix, ...issue.path];
    if (issue.code === "invalid_union" && issue.errors?.length) {
      // Report the alternative that came closest (fewest problems) rather than "Invalid input".
      const best = [...issue.errors].sort((a, b) => a.length - b.length)[0];
      if (best.length) { collect(best, path, out); continue; }
    }
    const key = path.length ? path.map(String).join(".") : "_root";
    out[key] = [...(out[key] ?? []), issue.message];
  }
}

/** zod issues → { "parts.3.front.interface": ["message"] }; issues about the whole body under "_root". */
export function fieldErrorsOf(issues: readonly Issue[], prefix: readonly PropertyKey[] = []): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  collect(issues, prefix, out);
  return out;
}
