import { z } from "zod";
import { REQUEST_STATUSES } from "@/db/schema";

export const QUEUE_SORTS = ["newest", "oldest", "number", "rider", "status"] as const;

/** Query string of GET /api/requests. */
export const queueQuerySchema = z.object({
  status: z.enum(REQUEST_STATUSES, { message: "Unknown status" }).optional(),
  q: z.string().trim().max(100, "Search is limited to 100 characters").optional(),
  page: z.coerce.number().int("Page must be a whole number").min(1, "Page starts at 1").default(1),
  pageSize: z.coerce
    .number()
    .int("Page size must be a whole number")
    .min(1, "Page size is at least 1")
    .max(100, "Page size is at most 100")
    .default(25),
  sort: z.enum(QUEUE_SORTS, { message: `Sort is one of ${QUEUE_SORTS.join(", ")}` }).default("newest"),
});

export type QueueQuery = z.output<typeof queueQuerySchema>;
