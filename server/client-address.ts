/**
 * Where a request comes from, for the sign-in throttle. Without a proxy it is the socket's peer
 * address, which a client cannot choose. With TRUSTED_PROXIES set, express's `trust proxy` walks
 * X-Forwarded-For back past the listed proxies (docs/decisions/0301-sign-in-throttle.md).
 */
import type { Request as ExpressRequest } from "express";
import { isIP } from "node:net";

export type ClientAddressOptions = {
  /** CLIENT_ADDRESS_HEADER: a header a trusted proxy sets (e.g. cf-connecting-ip); "none" = off. */
  header: string | undefined;
  /** Whether the socket's peer is a trusted proxy (express's compiled `trust proxy`). */
  trusted: (address: string) => boolean;
};

export function clientAddress(req: ExpressRequest, opts: ClientAddressOptions): string | null {
  if (opts.header === "none") return null;
  const peer = req.socket.remoteAddress;
  if (opts.header && peer && opts.trusted(peer)) {
    const value = req.get(opts.header)?.split(",").at(-1)?.trim();
    return value && isIP(value) ? canonical(value) : null;
  }
  const ip = req.ip ?? peer;
  return ip && isIP(ip) ? canonical(ip) : null;
}

/** IPv4-mapped IPv6 (::ffff:192.0.2.1) as plain IPv4; everything lower-case. */
function canonical(ip: string): string {
  const lower = ip.toLowerCase();
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/.exec(lower);
  return mapped ? mapped[1] : lower;
}
