// Shared input handling of the staff request endpoints: the [id] segment and JSON bodies.
import type { z } from "zod";
import { HttpError } from "@/lib/api/respond";

export type IdContext = { params: Promise<{ id: string }> };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The request id from the URL; anything that is not a uuid cannot name a request (404, not a DB error). */
export async function requestIdFrom(context: IdContext): Promise<string> {
  const { id } = await context.params;
  if (!UUID.test(id)) throw new HttpError(404, "No such request.");
  return id.toLowerCase();
}

/** The JSON body validated by `schema` (a ZodError becomes 400 with the fields named). */
export async function jsonBody<S extends z.ZodType>(request: Request, schema: S): Promise<z.output<S>> {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    throw new HttpError(400, "The body must be JSON.");
  }
  return schema.parse(body);
}
