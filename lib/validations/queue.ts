import { z } from "zod";
import { REQUEST_STATUSES } from "@/lib/requests/status";
import { text } from "./text";
import { disciplineSchema } from "@/lib/sizing/vocab";

export const QUEUE_SORTS = [
  "newest",
  "oldest",
  "number",
  "number_asc",
  "rider",
  "rider_desc",
  "status",
  "status_desc",
] as const;
export type QueueSort = (typeof QUEUE_SORTS)[number];

const day = (field: string) => z.iso.date({ message: `${field} must be a date (YYYY-MM-DD)` }).optional();

/** Query string of GET /api/requests. Empty strings (a cleared filter) mean "no filter". */
export const queueQuerySchema = z
  .object({
    status: z.enum(REQUEST_STATUSES, { message: "Unknown status" }).optional(),
    q: text().trim().max(100, "Search is limited to 100 characters").optional(),
    discipline: disciplineSchema.optional(),
    bikeClass: text().trim().max(60, "Bike class is limited to 60 characters").optional(),
    // A staff user id, "me" (the caller) or "unassigned".
    tuner: text().trim().max(100, "Tuner is limited to 100 characters").optional(),
    from: day("From"),
    to: day("To"),
    page: z.coerce.number().int("Page must be a whole number").min(1, "Page starts at 1").default(1),
    pageSize: z.coerce
      .number()
      .int("Page size must be a whole number")
      .min(1, "Page size is at least 1")
      .max(100, "Page size is at most 100")
      .default(25),
    sort: z.enum(QUEUE_SORTS, { message: `Sort is one of ${QUEUE_SORTS.join(", ")}` }).default("newest"),
    // "1": also answer the number of requests per status (the queue's header cards).
    counts: z.enum(["1", "true"], { message: "counts is 1 or absent" }).optional(),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: "From must be on or before To", path: ["to"] });

export type QueueQuery = z.output<typeof queueQuerySchema>;

/** URL search params to the schema's input, dropping empty values. */
export function queueParams(searchParams: URLSearchParams): Record<string, string> {
  return Object.fromEntries([...searchParams].filter(([, v]) => v.trim() !== ""));
}
