// JSON calls to our API from the shop's admin forms: the server's `{ error, fields }` on refusal
// (components/ui/apply-server-errors.ts puts those fields back onto the form).
export type FieldErrors = Record<string, string>;

export type ApiResult<T> = { ok: true; data: T } | { ok: false; status: number; error: string; fields: FieldErrors };

export async function callApi<T>(url: string, method: string, body?: unknown): Promise<ApiResult<T>> {
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers: body === undefined ? {} : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    // Offline or the server unreachable: the form keeps what was typed and says so.
    return { ok: false, status: 0, error: "No connection to the server. Your entries are still here: try again.", fields: {} };
  }
  if (response.ok) return { ok: true, data: (response.status === 204 ? null : await response.json()) as T };
  const payload = (await response.json().catch(() => ({}))) as { error?: string; fields?: FieldErrors };
  return { ok: false, status: response.status, error: payload.error ?? "Something went wrong.", fields: payload.fields ?? {} };
}
