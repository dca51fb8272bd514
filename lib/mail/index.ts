// Public API of the mail module.
export { renderEmail, type RenderedEmail } from "./render";
export { sendMailInputSchema, MailInputError, type SendMailInput } from "./send";
export {
  queueMail,
  drainOutbox,
  kickOutbox,
  startOutboxWorker,
  stopOutboxWorker,
  configureOutbox,
  resetOutboxPolicy,
  backoffMs,
  DEFAULT_OUTBOX_POLICY,
  type OutboxPolicy,
  type QueuedMail,
  type QueueMailOptions,
  type DrainSummary,
} from "./outbox";
export { renderTemplate, queueTemplateEmail, type TemplateEnvelope } from "./templates";
