// The queue's client-side data: filters as URL parameters, and the fetch of GET /api/requests.
import type { RequestStatus, StaffNoticeKind } from "@/db/schema";
import { getJson } from "@/lib/api-client";

export interface QueueFilters {
  status: string;
  q: string;
  discipline: string;
  bikeClass: string;
  tuner: string;
  from: string;
  to: string;
  sort: string;
  page: number;
  pageSize: number;
}

export const FILTER_KEYS = ["status", "q", "discipline", "bikeClass", "tuner", "from", "to", "sort"] as const;
export const DEFAULT_PAGE_SIZE = 25;

export interface QueueRow {
  id: string;
  number: number;
  status: RequestStatus;
  riderName: string;
  riderEmail: string;
  bikeLabel: string;
  bikeClass: string | null;
  discipline: string;
  skill: string;
  assignedTunerName: string | null;
  createdAt: string;
  /** Unseen staff notices on this request: a new sag report, the rider's answer… */
  notices: StaffNoticeKind[];
}

export interface QueuePage {
  items: QueueRow[];
  total: number;
  counts: Record<RequestStatus, number>;
}

export function filtersFrom(params: URLSearchParams): QueueFilters {
  const get = (k: string) => params.get(k) ?? "";
  return {
    status: get("status"),
    q: get("q"),
    discipline: get("discipline"),
    bikeClass: get("bikeClass"),
    tuner: get("tuner"),
    from: get("from"),
    to: get("to"),
    sort: get("sort") || "newest",
    page: Math.max(1, Number(params.get("page")) || 1),
    pageSize: Number(params.get("pageSize")) || DEFAULT_PAGE_SIZE,
  };
}

/** Only non-default values, so the URL stays short and shareable. */
export function paramsFrom(f: QueueFilters): URLSearchParams {
  const p = new URLSearchParams();
  for (const k of FILTER_KEYS) if (f[k] && !(k === "sort" && f[k] === "newest")) p.set(k, f[k]);
  if (f.page > 1) p.set("page", String(f.page));
  if (f.pageSize !== DEFAULT_PAGE_SIZE) p.set("pageSize", String(f.pageSize));
  return p;
}

export async function fetchQueue(f: QueueFilters): Promise<QueuePage> {
  const params = paramsFrom(f);
  params.set("counts", "1");
  return getJson<QueuePage>(`/api/requests?${params}`, { fallback: "The queue could not load." });
}
