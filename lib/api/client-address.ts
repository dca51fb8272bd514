// Who is asking, for rate limits: the socket address by default, or the address a configured number
// of trusted proxies in front of the app saw (TRUST_PROXY_HOPS). A client can send any
// X-Forwarded-For it likes, so the header is only believed as far as our own proxies wrote it.
//
// `next start` does not give route handlers the socket address: Next copies it into
// X-Forwarded-For only when the client sent none, so with a forged header the real address is lost.
// `npm start` therefore runs scripts/server.ts, a thin wrapper around Next's request handler that
// writes the socket address into PEER_HEADER (replacing whatever the client sent) and marks the
// process so this module believes that header. Without the wrapper (plain `next start`, `next dev`)
// the socket address is unknown and every direct client shares one bucket: never "trust the header".
import { isIP } from "node:net";
import { getEnv } from "@/lib/env";

/** Set by scripts/server.ts from the socket; a client's own value is replaced there. */
export const PEER_HEADER = "x-sagwise-peer-address";
/** The address this module decided on, handed to better-auth (advanced.ipAddress.ipAddressHeaders). */
export const CLIENT_HEADER = "x-sagwise-client-address";

const PEER_MARK = Symbol.for("sagwise.peer-header-trusted");
type Marked = { [PEER_MARK]?: boolean };

/** Called by the server wrapper (and by tests standing in for it): PEER_HEADER comes from the socket. */
export function trustPeerHeader(trusted = true): void {
  (globalThis as Marked)[PEER_MARK] = trusted;
}

function peerHeaderTrusted(): boolean {
  return (globalThis as Marked)[PEER_MARK] === true;
}

/** A valid IPv4/IPv6 address in one spelling (IPv4-mapped IPv6 as plain IPv4), or null. */
export function normaliseAddress(raw: string | null | undefined): string | null {
  if (!raw) return null;
  let value = raw.trim();
  // "[2001:db8::1]:443" and "192.0.2.1:443" as some proxies write them.
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(value);
  if (bracketed?.[1]) value = bracketed[1];
  else if (/^\d{1,3}(\.\d{1,3}){3}:\d+$/.test(value)) value = value.slice(0, value.lastIndexOf(":"));
  const mapped = /^::ffff:(\d{1,3}(\.\d{1,3}){3})$/i.exec(value);
  if (mapped?.[1]) value = mapped[1];
  return isIP(value) ? value.toLowerCase() : null;
}

/**
 * The client's address, or null when it cannot be known (then callers use one shared bucket).
 * hops = 0: the socket address. hops = N: the Nth address from the right of X-Forwarded-For, the
 * one our outermost trusted proxy appended; a request with fewer entries did not pass through all
 * our proxies, and then only the socket address is believed.
 */
export function clientAddress(request: Request | Headers, hops = getEnv().TRUST_PROXY_HOPS): string | null {
  const headers = request instanceof Headers ? request : request.headers;
  const peer = peerHeaderTrusted() ? normaliseAddress(headers.get(PEER_HEADER)) : null;
  if (hops === 0) return peer;
  const chain = (headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((entry) => entry.trim())
    .filter(Boolean);
  if (chain.length < hops) return peer;
  return normaliseAddress(chain[chain.length - hops]) ?? peer;
}

/** The rate-limit key: the address, or one bucket shared by every client whose address is unknown. */
export function clientKey(request: Request | Headers): string {
  return clientAddress(request) ?? "unknown-address";
}

/** The request's headers with CLIENT_HEADER holding our decision (absent when unknown). */
export function clientHeaders(request: Request): Headers {
  const headers = new Headers(request.headers);
  headers.delete(CLIENT_HEADER);
  const address = clientAddress(request);
  if (address) headers.set(CLIENT_HEADER, address);
  return headers;
}

/** A copy of the request carrying clientHeaders, for better-auth's handler. */
export function withClientHeader(request: Request): Request {
  const headers = clientHeaders(request);
  const init: RequestInit & { duplex?: "half" } = { method: request.method, headers, signal: request.signal };
  if (request.method !== "GET" && request.method !== "HEAD") {
    init.body = request.body;
    init.duplex = "half";
  }
  return new Request(request.url, init);
}
