// Every e-mail template by name, with its subject line and demo props, for sending (lib/mail's
// sendTemplateEmail) and for the staff preview page.
import type { ReactElement } from "react";
import * as orderStage from "./order-stage";
import * as paymentReceived from "./payment-received";
import * as requestDeclined from "./request-declined";
import * as requestReceived from "./request-received";
import * as serviceReminder from "./service-reminder";
import * as sheetReady from "./sheet-ready";
import * as signInLink from "./sign-in-link";
import * as staffInvite from "./staff-invite";
import * as staffNotice from "./staff-notice";
import * as tunerQuestion from "./tuner-question";

export interface EmailTemplate<P> {
  Component: (props: P) => ReactElement;
  subject: (props: P) => string;
  demoProps: P;
  /** What the template is for, shown on the preview page. */
  description: string;
}

export const emailTemplates = {
  "sign-in-link": {
    Component: signInLink.SignInLinkEmail,
    subject: signInLink.subject,
    demoProps: signInLink.demoProps,
    description: "Rider sign-in link by e-mail",
  } satisfies EmailTemplate<signInLink.SignInLinkEmailProps>,
  "staff-invite": {
    Component: staffInvite.StaffInviteEmail,
    subject: staffInvite.subject,
    demoProps: staffInvite.demoProps,
    description: "Invitation to the shop workspace",
  } satisfies EmailTemplate<staffInvite.StaffInviteEmailProps>,
  "request-received": {
    Component: requestReceived.RequestReceivedEmail,
    subject: requestReceived.subject,
    demoProps: requestReceived.demoProps,
    description: "Confirmation with the private status link",
  } satisfies EmailTemplate<requestReceived.RequestReceivedEmailProps>,
  "tuner-question": {
    Component: tunerQuestion.TunerQuestionEmail,
    subject: tunerQuestion.subject,
    demoProps: tunerQuestion.demoProps,
    description: "A tuner's question to the rider",
  } satisfies EmailTemplate<tunerQuestion.TunerQuestionEmailProps>,
  "request-declined": {
    Component: requestDeclined.RequestDeclinedEmail,
    subject: requestDeclined.subject,
    demoProps: requestDeclined.demoProps,
    description: "Request declined, with the reason",
  } satisfies EmailTemplate<requestDeclined.RequestDeclinedEmailProps>,
  "sheet-ready": {
    Component: sheetReady.SheetReadyEmail,
    subject: sheetReady.subject,
    demoProps: sheetReady.demoProps,
    description: "Approved (or revised) setup sheet with its download link",
  } satisfies EmailTemplate<sheetReady.SheetReadyEmailProps>,
  "staff-notice": {
    Component: staffNotice.StaffNoticeEmail,
    subject: staffNotice.subject,
    demoProps: staffNotice.demoProps,
    description: "Notice to the shop: new request, rider's answer, sag report or payment",
  } satisfies EmailTemplate<staffNotice.StaffNoticeEmailProps>,
  "service-reminder": {
    Component: serviceReminder.ServiceReminderEmail,
    subject: serviceReminder.subject,
    demoProps: serviceReminder.demoProps,
    description: "Service due soon (or overdue), with a link to book it",
  } satisfies EmailTemplate<serviceReminder.ServiceReminderEmailProps>,
  "order-stage": {
    Component: orderStage.OrderStageEmail,
    subject: orderStage.subject,
    demoProps: orderStage.demoProps,
    description: "An order reached a stage the shop tells riders about",
  } satisfies EmailTemplate<orderStage.OrderStageEmailProps>,
  "payment-received": {
    Component: paymentReceived.PaymentReceivedEmail,
    subject: paymentReceived.subject,
    demoProps: paymentReceived.demoProps,
    description: "Payment for an order received",
  } satisfies EmailTemplate<paymentReceived.PaymentReceivedEmailProps>,
} as const;

export type EmailTemplateName = keyof typeof emailTemplates;
export type EmailTemplateProps<N extends EmailTemplateName> = (typeof emailTemplates)[N]["demoProps"];
export const emailTemplateNames = Object.keys(emailTemplates) as EmailTemplateName[];

export { SignInLinkEmail, type SignInLinkEmailProps } from "./sign-in-link";
export { StaffInviteEmail, type StaffInviteEmailProps, type StaffRole } from "./staff-invite";
