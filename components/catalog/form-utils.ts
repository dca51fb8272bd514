// Small helpers for the shop's admin forms (client side): zod issues by dotted path, and JSON calls
// to our API that return the server's `{ error, fields }` on refusal.
import type { ZodError } from "zod";

export type FieldErrors = Record<string, string>;

export function issuesByPath(error: ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) out[issue.path.map(String).join(".") || "_"] ??= issue.message;
  return out;
}

export type ApiResult<T> = { ok: true; data: T } | { ok: false; status: number; error: string; fields: FieldErrors };

export async function callApi<T>(url: string, method: string, body?: unknown): Promise<ApiResult<T>> {
  const response = await fetch(url, {
    method,
    headers: body === undefined ? {} : { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (response.ok) return { ok: true, data: (response.status === 204 ? null : await response.json()) as T };
  const payload = (await response.json().catch(() => ({}))) as { error?: string; fields?: FieldErrors };
  return { ok: false, status: response.status, error: payload.error ?? "Something went wrong.", fields: payload.fields ?? {} };
}

/** Immutable set of a dotted path ("spec.rear.stockRateNmm") in a plain object. */
export function setIn<T>(obj: T, path: string, value: unknown): T {
  const [head, ...rest] = path.split(".");
  const base = (Array.isArray(obj) ? [...obj] : { ...(obj as object) }) as Record<string, unknown>;
  base[head!] = rest.length ? setIn(base[head!] ?? {}, rest.join("."), value) : value;
  return base as T;
}

export function getIn(obj: unknown, path: string): unknown {
  return path.split(".").reduce<unknown>((o, k) => (o && typeof o === "object" ? (o as Record<string, unknown>)[k] : undefined), obj);
}
