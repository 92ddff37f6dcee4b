// Reading request bodies: the stream is read only up to the limit, then abandoned (413),
// whether or not the client sent a Content-Length.
import type { z } from "zod";
import { AppError, fieldErrorsOf } from "@/lib/errors";
import { findNul, NUL_MESSAGE } from "@/lib/validation/nul";

const tooLarge = (maxBytes: number) =>
  new AppError("payload_too_large", `The request is larger than ${maxBytes >= 1e6 ? `${Math.round(maxBytes / 1e5) / 10} MB` : `${Math.round(maxBytes / 1e3)} kB`}.`);

/** The body's bytes, at most `maxBytes`; throws `payload_too_large` as soon as more arrive. */
export async function readBodyBytes(request: Request, maxBytes: number, onTooLarge: () => AppError = () => tooLarge(maxBytes)): Promise<Uint8Array> {
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > maxBytes) throw onTooLarge();
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => {});
      throw onTooLarge();
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) { out.set(c, at); at += c.byteLength; }
  return out;
}

/** application/json or a +json type, any charset; anything else is 415. */
export function assertJsonContentType(request: Request): void {
  const type = (request.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
  if (type !== "application/json" && !/^application\/[a-z0-9.+-]+\+json$/.test(type)) {
    throw new AppError("unsupported_media_type", "Send the body as JSON with Content-Type: application/json.");
  }
}

/** Read a JSON body: 415 unless it says JSON, 413 past `maxBytes`, 400 when it is not JSON. */
export async function readJsonBody(request: Request, maxBytes = 1_000_000): Promise<unknown> {
  assertJsonContentType(request);
  const bytes = await readBodyBytes(request, maxBytes);
  let value: unknown;
  try {
    value = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
  } catch {
    throw new AppError("bad_request:json", "The request body is not valid JSON.");
  }
  refuseNul(value);
  return value;
}

/** PostgreSQL text cannot hold NUL: refuse it (naming the field) before it reaches a query. */
export function refuseNul(raw: unknown): void {
  const at = findNul(raw);
  if (at) throw new AppError("bad_request:validation", "Some fields need attention.", { [at]: [NUL_MESSAGE] });
}

/** Parse a JSON body with a zod schema: 415 unless JSON, 413 past `maxBytes`, 400 with field errors when it does not fit. */
export async function parseJsonBody<S extends z.ZodType>(request: Request, schema: S, maxBytes = 1_000_000): Promise<z.output<S>> {
  return parseWith(schema, await readJsonBody(request, maxBytes));
}

/** Validate an already-read value the same way: NUL refused, 400 with field errors. */
export function parseWith<S extends z.ZodType>(schema: S, raw: unknown): z.output<S> {
  refuseNul(raw);
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw new AppError("bad_request:validation", "Some fields need attention.", fieldErrorsOf(parsed.error.issues));
  return parsed.data;
}

