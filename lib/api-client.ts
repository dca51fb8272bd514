// The one client for calling our API from components. Every answer comes back in one shape: the
// data, or the server's `{ error, fields }` (lib/api/respond.ts) with the status; a lost connection
// is status 0 with a message that says what happened to the user's input.
export type FieldErrors = Record<string, string>;

export type ApiResult<T> =
  { ok: true; status: number; data: T } | { ok: false; status: number; error: string; fields: FieldErrors };

export interface CallOptions {
  /** Shown when the server cannot be reached; say what became of the user's input. */
  offline?: string;
  /** Shown when a refusal carries no message of its own. */
  fallback?: string;
}

const OFFLINE = "No connection to the server. Your entries are still here: try again.";

/** Calls `url`; a FormData body goes as multipart, anything else as JSON. */
export async function callApi<T>(
  url: string,
  method = "GET",
  body?: unknown,
  options: CallOptions = {},
): Promise<ApiResult<T>> {
  const multipart = typeof FormData !== "undefined" && body instanceof FormData;
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers:
        body === undefined || multipart
          ? { accept: "application/json" }
          : { accept: "application/json", "content-type": "application/json" },
      body: body === undefined ? undefined : multipart ? (body as FormData) : JSON.stringify(body),
    });
  } catch {
    return { ok: false, status: 0, error: options.offline ?? OFFLINE, fields: {} };
  }
  if (response.ok) {
    const data = response.status === 204 ? null : await response.json().catch(() => null);
    return { ok: true, status: response.status, data: data as T };
  }
  const payload = (await response.json().catch(() => ({}))) as { error?: string; fields?: FieldErrors };
  return {
    ok: false,
    status: response.status,
    error: payload.error ?? options.fallback ?? "Something went wrong.",
    fields: payload.fields ?? {},
  };
}

/** The error with each field's message after it, for screens that show one line. */
export function errorWithFields(result: { error: string; fields: FieldErrors }): string {
  const fields = Object.entries(result.fields)
    .map(([k, m]) => `${k}: ${m}`)
    .join("; ");
  return fields ? `${result.error} ${fields}` : result.error;
}

/** Thrown by `getJson` so a query library (TanStack Query) sees a failed load. */
export class ApiError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly fields: FieldErrors,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

/** GET for queries: the data, or an ApiError with the server's message and fields. */
export async function getJson<T>(url: string, options: CallOptions = {}): Promise<T> {
  const result = await callApi<T>(url, "GET", undefined, options);
  if (!result.ok) throw new ApiError(errorWithFields(result), result.status, result.fields);
  return result.data;
}
