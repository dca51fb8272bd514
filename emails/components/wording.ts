// The shop's own words for a rider e-mail: the heading and the opening paragraph, stored per
// template (shop settings, "E-mail wording"). Empty means the template's own words. Three
// placeholders are filled in when the e-mail is built; nothing else in the text is interpreted.
export interface EmailWording {
  heading?: string | null;
  intro?: string | null;
}

export const WORDING_PLACEHOLDERS = ["rider", "request", "shop"] as const;
export type WordingPlaceholder = (typeof WORDING_PLACEHOLDERS)[number];

/** "{rider}", "{request}" and "{shop}" replaced by their values; any other text is kept as typed. */
export function fillWording(text: string, values: Record<WordingPlaceholder, string>): string {
  return text.replace(/\{(rider|request|shop)\}/g, (_, key: WordingPlaceholder) => values[key]);
}
