// What no person may read on a page, in an e-mail or on a sheet: a raw code of the engine or the
// database (lib/labels.ts holds the words for each) or one of zod's default messages. Shared by the
// unit test of the vocabulary and the browser sweep of every page.
import { STAFF_NOTICE_KINDS } from "@/db/tables/notices";
import { ALL_LABEL_TABLES, AUDIT_ACTION_LABELS, EMAIL_TEMPLATE_LABELS, RATE_TRIGGER_LABELS } from "@/lib/labels";

/** Codes that are not also plain words: hyphenated, snake_case or camelCase ("harsh-small-bumps"). */
export const RAW_CODES: readonly string[] = [
  ...new Set(
    [
      ...Object.values(ALL_LABEL_TABLES).flatMap((t) => Object.keys(t)),
      ...Object.keys(AUDIT_ACTION_LABELS),
      ...Object.keys(EMAIL_TEMPLATE_LABELS),
      ...Object.keys(RATE_TRIGGER_LABELS),
      ...STAFF_NOTICE_KINDS,
    ].filter((code) => /[-_.]|[a-z][A-Z]/.test(code)),
  ),
];

// zod 4's own wording (its English locale: "Too small: expected number to be >=1", "Invalid input:
// expected number, received string"): none of it may reach a person. "Expected sag" is ours.
export const ZOD_DEFAULTS: readonly RegExp[] = [
  /expected \w+ to (be|have)/i,
  /expected \w+, received/i,
  /Too small/,
  /Too big/,
  /Invalid input/,
  /Invalid option/,
];

const codePatterns = RAW_CODES.map(
  (code) => [code, new RegExp(`(^|[^\\w/-])${code.replace(/[.]/g, "\\.")}($|[^\\w/-])`)] as const,
);

/** The raw codes and zod defaults found in `text` (a code inside a path or a longer word is not one). */
export function unspokenWords(text: string): string[] {
  return [
    ...codePatterns.filter(([, pattern]) => pattern.test(text)).map(([code]) => code),
    ...ZOD_DEFAULTS.filter((pattern) => pattern.test(text)).map(String),
  ];
}
