// What the typed-date field (day-input.tsx) shows and sends, kept apart from React so the order of
// events can be tested. The field sends an ISO day up only once the text is a real date ("" when
// emptied); the parent's value comes back later (a URL update), sometimes after more typing. A value
// coming back that this field sent is its own echo and leaves the text alone; any other value came
// from outside (clear filters, back button) and replaces the text.
import { formatDay } from "@/lib/format";
import { parseTypedDay } from "@/lib/validations/typed-day";

export interface DayField {
  /** What the field shows, as typed. */
  text: string;
  /** The parent's value this state has taken in. */
  shown: string;
  /** Values sent up and not yet seen coming back, oldest first. */
  pending: string[];
}

/** Sends kept while waiting for their echo: more than a burst of typing ever leaves in flight. */
const PENDING_KEPT = 10;

export function dayField(value: string): DayField {
  return { text: value ? formatDay(value) : "", shown: value, pending: [] };
}

/** The tuner typed `text`: the new state, and the ISO day (or "") to send up, or null for none. */
export function typeDay(field: DayField, text: string): { field: DayField; send: string | null } {
  const day = parseTypedDay(text);
  const send = text.trim() === "" ? "" : day;
  const pending = send === null ? field.pending : [...field.pending, send].slice(-PENDING_KEPT);
  return { field: { ...field, text, pending }, send };
}

/** The parent's value is now `value`. */
export function receiveDay(field: DayField, value: string): DayField {
  if (value === field.shown) return field;
  const echo = field.pending.indexOf(value);
  if (echo >= 0) return { ...field, shown: value, pending: field.pending.slice(echo + 1) };
  const text = value === parseTypedDay(field.text) ? field.text : value ? formatDay(value) : "";
  return { text, shown: value, pending: [] };
}
