// Public API of the mail module.
export { renderEmail, type RenderedEmail } from "./render";
export {
  sendMail,
  sendMailInputSchema,
  MailInputError,
  DEFAULT_MAX_ATTEMPTS,
  DEFAULT_BASE_DELAY_MS,
  type SendMailInput,
  type SendMailOptions,
  type SendMailResult,
} from "./send";
export { renderTemplate, sendTemplateEmail, type TemplateEnvelope } from "./templates";
