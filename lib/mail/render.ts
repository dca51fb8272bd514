// React e-mail element → the html and plain-text parts of one message.
import { render, toPlainText } from "@react-email/render";
import type { ReactElement } from "react";

export interface RenderedEmail {
  html: string;
  text: string;
}

export async function renderEmail(element: ReactElement): Promise<RenderedEmail> {
  const html = await render(element);
  // Rendered once; react-email's own converter keeps link targets beside their text
  // ("Sign in https://…"), so the plain-text part still carries every link.
  return { html, text: toPlainText(html).trim() };
}
