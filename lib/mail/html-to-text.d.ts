// html-to-text ships no types; this is the part lib/mail/render.ts (and react-email's own typings)
// use: its README, "Options" and "compile".
declare module "html-to-text" {
  export interface SelectorDefinition {
    selector: string;
    format?: string;
    options?: Record<string, unknown>;
  }
  export interface HtmlToTextOptions {
    wordwrap?: number | false | null;
    selectors?: SelectorDefinition[];
  }
  /** Compiles the options once and returns the converter from html to plain text. */
  export function compile(options?: HtmlToTextOptions): (html: string) => string;
}
