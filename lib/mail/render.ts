// React e-mail element → the html and plain-text parts of one message.
import { compile } from "html-to-text";
import { plainTextSelectors, render } from "@react-email/render";
import type { ReactElement } from "react";

export interface RenderedEmail {
  html: string;
  text: string;
}

// react-email's own converter options (what its toPlainText passes to html-to-text), compiled once:
// compiling them is most of a conversion's cost, and toPlainText compiles them again on every call.
// It keeps link targets beside their text ("Sign in https://…"), so the plain-text part still
// carries every link.
const toPlainText = compile({ wordwrap: false, selectors: plainTextSelectors });

export async function renderEmail(element: ReactElement): Promise<RenderedEmail> {
  const html = await render(element);
  return { html, text: toPlainText(html).trim() };
}
