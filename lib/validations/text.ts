// Every text a person or a client sends goes through `text()`: a zod string that refuses the NUL
// character (U+0000). PostgreSQL cannot store NUL in text or jsonb ("invalid byte sequence" /
// "unsupported Unicode escape sequence"), so without this check such a body would fail at the
// database instead of being answered with the field that needs fixing.
import { z } from "zod";

export const NUL_MESSAGE = "Remove the hidden NUL character from this text (it cannot be stored)";

export const hasNul = (value: string): boolean => value.includes("\u0000");

/** z.string() that refuses NUL first, so the field's own limits and messages follow as usual. */
export function text() {
  return z.string().refine((value) => !hasNul(value), { message: NUL_MESSAGE, abort: true });
}
