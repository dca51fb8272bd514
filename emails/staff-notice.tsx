// A notice to the shop about a request: a new request, the rider's answer, a sag report, a payment.
// It goes to the assigned tuner, or to the shop's own address when nobody is assigned yet.
import { Button, Heading, Text } from "@react-email/components";
import { EmailLayout, emailStyles as s } from "./components/email-layout";

export type StaffNoticeEmailKind = "new-request" | "rider-answered" | "sag-reported" | "payment-received";

export interface StaffNoticeEmailProps {
  kind: StaffNoticeEmailKind;
  shopName: string;
  requestNumber: number;
  riderName: string;
  bikeLabel: string;
  /** The tuner's name when one is assigned; null when the shop's address gets it. */
  tunerName: string | null;
  /** One line of what happened, already in words (the verdict of a sag report, an amount paid). */
  summary: string | null;
  url: string;
}

const HEADINGS: Record<StaffNoticeEmailKind, string> = {
  "new-request": "New setup request",
  "rider-answered": "The rider answered your question",
  "sag-reported": "The rider reported the measured sag",
  "payment-received": "Payment received",
};

export const subject = ({ kind, requestNumber, riderName }: StaffNoticeEmailProps) =>
  `${HEADINGS[kind]}: request ${requestNumber} (${riderName})`;

export const demoProps: StaffNoticeEmailProps = {
  kind: "sag-reported",
  shopName: "Sagwise Demo Suspension",
  requestNumber: 1042,
  riderName: "Alex Demo",
  bikeLabel: "450 four-stroke motocross (typical values)",
  tunerName: "Sam Demo",
  summary: "Shock: spring right. Fork: spring too soft.",
  url: "https://demo.sagwise.test/shop/requests/demo-request-id",
};

export function StaffNoticeEmail(props: StaffNoticeEmailProps) {
  const heading = HEADINGS[props.kind];
  return (
    <EmailLayout
      shopName={props.shopName}
      preview={`${heading}: request ${props.requestNumber}, ${props.riderName}.`}
      reason={
        props.tunerName
          ? `You get this e-mail because request ${props.requestNumber} is assigned to you in the ${props.shopName} workspace.`
          : `You get this e-mail at the shop's address because request ${props.requestNumber} is not assigned to a tuner yet.`
      }
    >
      <Heading as="h1" style={s.heading}>
        {heading}
      </Heading>
      <Text style={s.paragraph}>
        Request {props.requestNumber}: {props.riderName}, {props.bikeLabel}.
      </Text>
      {props.summary ? <Text style={s.paragraph}>{props.summary}</Text> : null}
      <Text style={s.paragraph}>
        <Button href={props.url} style={s.button}>
          Open request {props.requestNumber}
        </Button>
      </Text>
      <Text style={s.small}>If the button does nothing, copy this address into your browser:</Text>
      <Text style={s.urlText}>{props.url}</Text>
    </EmailLayout>
  );
}

export default StaffNoticeEmail;
