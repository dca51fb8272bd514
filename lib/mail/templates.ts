// Renders a template from emails/ by name and queues it: the usual way the app sends mail.
import { createElement, type ComponentType } from "react";
import type { Executor } from "@/db/client";
import { emailTemplates, type EmailTemplateName, type EmailTemplateProps } from "@/emails";
import { queueMail, type QueueMailOptions, type QueuedMail } from "./outbox";
import { renderEmail } from "./render";
import type { SendMailInput } from "./send";

export type TemplateEnvelope = Pick<SendMailInput, "to" | "requestId" | "replyTo" | "attachments">;

export async function renderTemplate<N extends EmailTemplateName>(name: N, props: EmailTemplateProps<N>) {
  const entry = emailTemplates[name] as unknown as {
    Component: ComponentType<EmailTemplateProps<N>>;
    subject: (p: EmailTemplateProps<N>) => string;
  };
  const { html, text } = await renderEmail(createElement(entry.Component, props));
  return { subject: entry.subject(props), html, text };
}

/** Renders and queues in `executor` (the caller's transaction); kickOutbox() after the commit sends it. */
export async function queueTemplateEmail<N extends EmailTemplateName>(
  executor: Executor,
  name: N,
  props: EmailTemplateProps<N>,
  envelope: TemplateEnvelope,
  options?: QueueMailOptions,
): Promise<QueuedMail> {
  const rendered = await renderTemplate(name, props);
  return queueMail(executor, { template: name, ...envelope, ...rendered }, options);
}
