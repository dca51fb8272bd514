// The rider's private status link holds a long random token; only its SHA-256 is stored, so a
// database leak does not leak working links.
import { createHash, createHmac, randomBytes } from "node:crypto";

export function newStatusToken(): string {
  return randomBytes(32).toString("base64url");
}

export function hashStatusToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** Demo requests get tokens derived from the installation's secret: stable across seed runs,
 *  unguessable without the secret. */
export function demoStatusToken(secret: string, requestId: string): string {
  return createHmac("sha256", secret).update(`demo-status:${requestId}`).digest("base64url");
}

export function statusPath(token: string): string {
  return `/status/${token}`;
}
