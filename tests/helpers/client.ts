// Integration tests call route handlers directly, with no socket: they stand in for scripts/server.ts,
// which writes the socket address into PEER_HEADER, so each simulated client has an address of its
// own. 192.0.2.0/24 and 198.51.100.0/24 are documentation ranges (RFC 5737): headers only.
import { PEER_HEADER, trustPeerHeader } from "@/lib/api/client-address";

trustPeerHeader();

let next = 0;

/** Headers of a request arriving on a socket from `address` (a fresh address when omitted). */
export function fromClient(address?: string): Record<string, string> {
  next += 1;
  return { [PEER_HEADER]: address ?? `192.0.2.${next % 250}` };
}
