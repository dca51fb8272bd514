// Links to the sheet route, safe to import anywhere (no PDF code behind them).

/** Staff preview of any version of a request's sheet; drafts come watermarked. */
export function sheetPreviewPath(requestId: string, version: number): string {
  return `/api/requests/${encodeURIComponent(requestId)}/sheet?${new URLSearchParams({ version: String(version), preview: "1" })}`;
}
