// The frame of every e-mail a rider gets about a request: a greeting, a few paragraphs, a button
// (and at most one more), and the plain address of the main button's link, broken to fit a phone,
// for mail apps that hide buttons. No link is ever written out as bare text anywhere else.
import { Button, Heading, Text } from "@react-email/components";
import type { ReactNode } from "react";
import { EmailLayout, emailStyles as s } from "./email-layout";
import { fillWording, type EmailWording } from "./wording";

export interface RiderEmailProps {
  shopName: string;
  riderName: string;
  preview: string;
  heading: string;
  /** The template's own opening paragraph; the shop's wording replaces it when set. */
  intro: string;
  requestNumber?: number;
  wording?: EmailWording | null;
  children?: ReactNode;
  action: { label: string; url: string };
  /** Shown under the button's address. */
  after?: ReactNode;
  /** A second button under `after` (the sag report on the sheet e-mail). */
  secondary?: { label: string; url: string };
}

export const RIDER_EMAIL_REASON =
  "You get this e-mail because you asked this shop for a suspension setup. Keep it: the link is private to you.";

export function RiderEmail({
  shopName,
  riderName,
  preview,
  heading,
  intro,
  requestNumber,
  wording,
  children,
  action,
  after,
  secondary,
}: RiderEmailProps) {
  const values = {
    rider: riderName,
    request: requestNumber === undefined ? "" : String(requestNumber),
    shop: shopName,
  };
  return (
    <EmailLayout shopName={shopName} preview={preview} reason={RIDER_EMAIL_REASON}>
      <Heading as="h1" style={s.heading}>
        {wording?.heading?.trim() ? fillWording(wording.heading.trim(), values) : heading}
      </Heading>
      <Text style={s.paragraph}>Hello {riderName},</Text>
      <Text style={s.paragraph}>{wording?.intro?.trim() ? fillWording(wording.intro.trim(), values) : intro}</Text>
      {children}
      <Text style={s.paragraph}>
        <Button href={action.url} style={s.button}>
          {action.label}
        </Button>
      </Text>
      <Text style={s.small}>If the button does nothing, copy this address into your browser:</Text>
      <Text style={s.urlText}>{action.url}</Text>
      {after}
      {secondary ? (
        <Text style={s.paragraph}>
          <Button href={secondary.url} style={s.buttonSecondary}>
            {secondary.label}
          </Button>
        </Text>
      ) : null}
    </EmailLayout>
  );
}

/** A quoted block (the tuner's question, the reason for a decline), kept as the tuner wrote it. */
export function Quote({ children }: { children: ReactNode }) {
  return (
    <Text
      style={{
        ...s.paragraph,
        borderLeft: "4px solid #2f6b4f",
        paddingLeft: "12px",
        whiteSpace: "pre-wrap",
        color: "#1d2327",
      }}
    >
      {children}
    </Text>
  );
}
