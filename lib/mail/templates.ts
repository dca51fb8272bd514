// Renders a template from emails/ by name and sends it: the usual way the app sends mail.
import { createElement, type ComponentType } from "react";
import { emailTemplates, type EmailTemplateName, type EmailTemplateProps } from "@/emails";
import { renderEmail } from "./render";
import { sendMail, type SendMailInput, type SendMailOptions, type SendMailResult } from "./send";

export type TemplateEnvelope = Pick<SendMailInput, "to" | "requestId" | "replyTo" | "attachments">;

export async function renderTemplate<N extends EmailTemplateName>(name: N, props: EmailTemplateProps<N>) {
  const entry = emailTemplates[name] as unknown as {
    Component: ComponentType<EmailTemplateProps<N>>;
    subject: (p: EmailTemplateProps<N>) => string;
  };
  const { html, text } = await renderEmail(createElement(entry.Component, props));
  return { subject: entry.subject(props), html, text };
}

export async function sendTemplateEmail<N extends EmailTemplateName>(
  name: N,
  props: EmailTemplateProps<N>,
  envelope: TemplateEnvelope,
  options?: SendMailOptions,
): Promise<SendMailResult> {
  const rendered = await renderTemplate(name, props);
  return sendMail({ template: name, ...envelope, ...rendered }, options);
}
