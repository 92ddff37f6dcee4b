// Who is really asking: the socket's peer address, unless that peer is a proxy the operator
// configured (TRAINYARD_TRUSTED_PROXIES), in which case the nearest address in
// X-Forwarded-For that is not itself a trusted proxy. Off by default: with no proxies
// configured, forwarded headers from clients are thrown away.
import { BlockList, isIP } from "node:net";

/** "::ffff:10.0.0.1" → "10.0.0.1"; anything else as it is. */
export function normalizeAddress(address: string): string {
  const a = address.trim().replace(/^\[|\]$/g, "");
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(a);
  return mapped ? mapped[1] : a.toLowerCase();
}

/** Parse "10.0.0.0/8, 127.0.0.1, ::1" (addresses or CIDR ranges). Throws on a malformed entry. */
export function parseTrustedProxies(value: string | undefined): BlockList | null {
  const entries = (value ?? "").split(",").map((s) => s.trim()).filter(Boolean);
  if (entries.length === 0) return null;
  const list = new BlockList();
  for (const entry of entries) {
    const [addr, bits] = entry.split("/");
    const a = normalizeAddress(addr);
    const family = isIP(a) === 6 ? "ipv6" : isIP(a) === 4 ? "ipv4" : null;
    if (!family) throw new Error(`TRAINYARD_TRUSTED_PROXIES: "${entry}" is not an IP address or CIDR range`);
    if (bits === undefined) list.addAddress(a, family);
    else list.addSubnet(a, Number(bits), family);
  }
  return list;
}

function isTrusted(list: BlockList, address: string): boolean {
  const a = normalizeAddress(address);
  const family = isIP(a) === 6 ? "ipv6" : isIP(a) === 4 ? "ipv4" : null;
  return family !== null && list.check(a, family);
}

/** The client address to key limits on and log. */
export function clientAddress(peer: string, forwardedFor: string | undefined, trusted: BlockList | null): string {
  const self = normalizeAddress(peer);
  if (!trusted || !isTrusted(trusted, self)) return self;
  const hops = (forwardedFor ?? "").split(",").map((s) => normalizeAddress(s)).filter((s) => isIP(s) !== 0);
  // Walk from the nearest hop back; the first address no trusted proxy vouches for is the client.
  for (let i = hops.length - 1; i >= 0; i--) if (!isTrusted(trusted, hops[i])) return hops[i];
  return hops[0] ?? self;
}

const FORWARDED = ["x-forwarded-for", "x-forwarded-host", "x-forwarded-proto", "x-forwarded-port", "x-real-ip", "forwarded"];

/**
 * Rewrite an incoming request's headers in place before Next.js sees them: X-Forwarded-For
 * becomes the one client address; the other forwarded headers survive only from a trusted proxy.
 */
export function sanitizeForwardedHeaders(headers: Record<string, string | string[] | undefined>, peer: string, trusted: BlockList | null) {
  const xff = headers["x-forwarded-for"];
  const client = clientAddress(peer, Array.isArray(xff) ? xff.join(",") : xff, trusted);
  const fromProxy = !!trusted && isTrusted(trusted, peer);
  if (!fromProxy) for (const h of FORWARDED) delete headers[h];
  headers["x-forwarded-for"] = client;
}
