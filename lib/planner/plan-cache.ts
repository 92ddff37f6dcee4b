import "server-only";
// Identical catalog plans get identical answers until the catalog changes: keep the serialised
// answers of recent ones (per process, keyed by catalog version and the request), so a link
// pasted in a busy forum thread costs one solve, not one per visitor. Plans from a person's own
// gear (or a shop's stock) depend on who asks and are never cached. The answers are kept as
// UTF-8 bytes, ready for the socket: a hit neither serialises nor encodes (the flagship answer
// is about 23 kB, and turning it from a string into bytes was a tenth of a cached solve).
import { getCatalogVersion } from "@/db/queries/parts";
import type { SessionUser } from "@/lib/auth/session";
import { runPlan, type PlanInput } from "./run-plan";

const MAX_ENTRIES = 500;
/** Requests with many inline parts are rare and large: not worth the memory. */
const MAX_KEY_CHARS = 20_000;
const cache = new Map<string, Uint8Array<ArrayBuffer>>();
const utf8 = new TextEncoder();

/** The plan's answer as JSON bytes (shared with later hits; a Response copies the bytes it is given). */
export async function planJson({ input, viewer }: { input: PlanInput; viewer: SessionUser | null }): Promise<Uint8Array<ArrayBuffer>> {
  const cacheable = !input.source || input.source.kind === "catalog";
  if (!cacheable) return utf8.encode(JSON.stringify(await runPlan({ input, viewer })));
  const key = `${await getCatalogVersion()}|${JSON.stringify(input)}`;
  const hit = key.length <= MAX_KEY_CHARS ? cache.get(key) : undefined;
  if (hit !== undefined) {
    cache.delete(key);
    cache.set(key, hit); // most recently used last
    return hit;
  }
  const body = utf8.encode(JSON.stringify(await runPlan({ input, viewer })));
  if (key.length <= MAX_KEY_CHARS) {
    cache.set(key, body);
    if (cache.size > MAX_ENTRIES) cache.delete(cache.keys().next().value!);
  }
  return body;
}
