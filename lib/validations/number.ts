// Numbers people type. Many phone keyboards (and most of Europe) write a decimal comma: "86,5" is
// 86.5 kg. Every number a person types goes through `typedNumber()` (or `readTypedNumber` in a
// schema of its own), so the form in the browser and the handler on the server read it alike.
import { z } from "zod";

// One comma as the only separator, digits on at least one side: "86,5", ",5", "86,". A text with a
// dot and a comma ("1,234.5") is left alone: it is ambiguous and gets the field's own message.
const DECIMAL_COMMA = /^[+-]?(\d+,\d*|,\d+)$/;

/**
 * The shared preprocess: a typed text becomes a number ("86,5" → 86.5, " 12.5 " → 12.5), an empty
 * text (or null) becomes `undefined` ("not given", never 0), and text that is no number is passed on as it
 * is, so the schema answers with the field's own message instead of reading it as NaN or 0.
 */
export function readTypedNumber(value: unknown): unknown {
  if (value === null) return undefined;
  if (typeof value !== "string") return value;
  const trimmed = value.trim();
  if (trimmed === "") return undefined;
  const number = Number(DECIMAL_COMMA.test(trimmed) ? trimmed.replace(",", ".") : trimmed);
  return Number.isFinite(number) ? number : value;
}

/**
 * A number a person types: `typedNumber(z.number({ message: "Enter the weight as a number" }).positive(…))`.
 * The schema inside says what the number must be; the preprocess reads the text first.
 */
export function typedNumber<T extends z.ZodType>(schema: T) {
  return z.preprocess(readTypedNumber, schema);
}
