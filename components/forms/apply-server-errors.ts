// The server stays the authority: its 400 `{ fields: { "a.b": msg } }` is put back onto the form's
// own fields with setError, so the message shows beside the input the person has to fix.
import type { FieldPath, FieldValues, UseFormSetError } from "react-hook-form";

export interface ServerErrorOptions {
  /** Part of the server path the form does not have, e.g. "values." when the form edits `values` only. */
  prefix?: string;
  /** Top-level names the form has; a path outside them (e.g. "_" or "discipline") is returned instead. */
  fields?: readonly string[];
}

/** Server paths → form paths; paths the form cannot show come back under `unplaced`. */
export function serverErrorsToForm(serverFields: Record<string, string> | undefined, options: ServerErrorOptions = {}) {
  const placed: [path: string, message: string][] = [];
  const unplaced: string[] = [];
  for (const [raw, message] of Object.entries(serverFields ?? {})) {
    const path = options.prefix && raw.startsWith(options.prefix) ? raw.slice(options.prefix.length) : raw;
    const top = path.split(".")[0] ?? "";
    const known = path !== "_" && path !== "" && (!options.fields || options.fields.includes(top));
    if (known && (!options.prefix || raw.startsWith(options.prefix))) placed.push([path, message]);
    else unplaced.push(message);
  }
  return { placed, unplaced };
}

/** Sets each placeable server message on its field; returns the messages no field can show. */
export function applyServerErrors<T extends FieldValues>(
  setError: UseFormSetError<T>,
  serverFields: Record<string, string> | undefined,
  options: ServerErrorOptions = {},
): string[] {
  const { placed, unplaced } = serverErrorsToForm(serverFields, options);
  for (const [path, message] of placed) setError(path as FieldPath<T>, { type: "server", message });
  return unplaced;
}

/** A nested error message by dotted path; a list's own message may sit on the list or on its `root`. */
export function errorAt(errors: unknown, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split(".")) {
    if (!node || typeof node !== "object") return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  if (!node || typeof node !== "object") return undefined;
  const { message, root } = node as { message?: unknown; root?: { message?: unknown } };
  const text = typeof message === "string" ? message : root?.message;
  return typeof text === "string" ? text : undefined;
}

/** Text typed into a number input → the number the schema checks ("" → empty, "1,5" → 1.5, "x" → NaN). */
export function toNumber(empty: undefined | null = undefined) {
  return (value: unknown): number | undefined | null => {
    if (typeof value === "number") return value;
    const text = String(value ?? "")
      .trim()
      .replace(",", ".");
    return text === "" ? empty : Number(text);
  };
}
