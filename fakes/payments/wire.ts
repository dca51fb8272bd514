// The payment SDK's wire format, as far as Sagwise uses it: form-encoded request bodies with
// bracketed keys (`line_items[0][price_data][currency]=eur`), JSON answers, errors as
// `{ error: { type, message, param } }`, and the webhook signature header
// `t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<payload>" keyed with the endpoint secret>`
// (the service's documented scheme for verifying webhook signatures by hand).
import { createHmac, randomBytes } from "node:crypto";

type Nested = { [key: string]: Nested | string | Nested[] | string[] };

/** `a[b][0][c]=x` → `{ a: { b: [ { c: "x" } ] } }`. */
export function parseForm(body: string): Nested {
  const root: Nested = {};
  for (const [rawKey, value] of new URLSearchParams(body)) {
    const parts = rawKey.replace(/\]/g, "").split("[");
    let node: Record<string, unknown> = root;
    parts.forEach((part, i) => {
      const last = i === parts.length - 1;
      const nextIsIndex = !last && /^\d+$/.test(parts[i + 1]!);
      if (last) node[part] = value;
      else {
        node[part] ??= nextIsIndex ? [] : {};
        node = node[part] as Record<string, unknown>;
      }
    });
  }
  return root;
}

export function signPayload(payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)): string {
  const signature = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${signature}`;
}

export const newId = (prefix: string) => `${prefix}_test_${randomBytes(12).toString("hex")}`;

export function apiError(status: number, message: string, param?: string) {
  return { status, body: { error: { type: "invalid_request_error", message, ...(param ? { param } : {}) } } };
}
