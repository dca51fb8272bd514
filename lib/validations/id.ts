// Row ids are UUIDs (RFC 9562); anything else in a URL cannot name a row, so it is a 404 before any
// query, never a database error.
import { z } from "zod";

export const uuidSchema = z.uuid();

export const isUuid = (value: string): boolean => uuidSchema.safeParse(value).success;
