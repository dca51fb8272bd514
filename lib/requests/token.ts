// The rider's private status links: a long random token in the URL, only its SHA-256 stored.
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

export function sheetPath(requestId: string, version: number, token?: string): string {
  const query = new URLSearchParams({ version: String(version) });
  if (token) query.set("token", token);
  return `/api/requests/${requestId}/sheet?${query}`;
}
