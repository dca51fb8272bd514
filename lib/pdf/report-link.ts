// The private link printed on a sheet for reporting measured sag. It is derived from the server
// secret and the request id (HMAC, like the demo links), and stored hashed like every status link:
// rendering the sheet again prints the same working link instead of minting a new one each time,
// and without the secret nobody can compute it.
import { createHmac } from "node:crypto";
import { createStatusLink } from "@/db/queries/status-links";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { appBaseUrl } from "@/lib/env";
import { statusPath } from "@/lib/requests/token";

export function sheetStatusToken(secret: string, requestId: string): string {
  return createHmac("sha256", secret).update(`sheet-status:${requestId}`).digest("base64url");
}

/** The sheet's report link for this request; stores its hash the first time (idempotent). */
export async function ensureSheetReportUrl(requestId: string): Promise<string> {
  const token = sheetStatusToken(resolveAuthSecret(), requestId);
  await createStatusLink(requestId, undefined, token);
  return `${appBaseUrl()}${statusPath(token)}`;
}
