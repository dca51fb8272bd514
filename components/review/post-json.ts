// Calls one of our JSON endpoints and returns the answer or its error in one shape.
export type JsonResult =
  | { ok: true; body: unknown }
  | { ok: false; status: number; error: string; fields?: Record<string, string> };

export async function postJson(url: string, method: "POST" | "PATCH", body: unknown): Promise<JsonResult> {
  let response: Response;
  try {
    response = await fetch(url, { method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  } catch {
    return { ok: false, status: 0, error: "No connection to the server. Nothing was changed; try again." };
  }
  const json = (await response.json().catch(() => ({}))) as { error?: string; fields?: Record<string, string> };
  if (response.ok) return { ok: true, body: json };
  const fields = json.fields ? ` ${Object.entries(json.fields).map(([k, m]) => `${k}: ${m}`).join("; ")}` : "";
  return { ok: false, status: response.status, error: `${json.error ?? "The request failed."}${fields}`, fields: json.fields };
}
