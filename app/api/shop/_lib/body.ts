// Shared bits of the shop API's handlers.
import { z } from "zod";
import { HttpError } from "@/lib/api/respond";

/** The JSON body, or a 400 that says so (never a 500 for a malformed body). */
export async function jsonBody(request: Request): Promise<unknown> {
  try {
    return await request.json();
  } catch {
    throw new HttpError(400, "Send the form as JSON.");
  }
}

/** Route ids are UUIDs; anything else is a missing record, not a database error. */
export async function uuidParam(params: Promise<{ id: string }>, what: string): Promise<string> {
  const { id } = await params;
  if (!z.uuid().safeParse(id).success) throw new HttpError(404, `No such ${what}.`);
  return id;
}

export type IdContext = { params: Promise<{ id: string }> };
