// Every e-mail template by name, with its subject line and demo props, for sending (lib/mail's
// sendTemplateEmail) and for the staff preview page.
import type { ReactElement } from "react";
import * as signInLink from "./sign-in-link";
import * as staffInvite from "./staff-invite";

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
} as const;

export type EmailTemplateName = keyof typeof emailTemplates;
export type EmailTemplateProps<N extends EmailTemplateName> = (typeof emailTemplates)[N]["demoProps"];
export const emailTemplateNames = Object.keys(emailTemplates) as EmailTemplateName[];

export { SignInLinkEmail, type SignInLinkEmailProps } from "./sign-in-link";
export { StaffInviteEmail, type StaffInviteEmailProps, type StaffRole } from "./staff-invite";
