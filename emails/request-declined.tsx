// The shop cannot take the request; the reason as the tuner wrote it.
import { Text } from "@react-email/components";
import { Quote, RiderEmail } from "./components/rider-email";
import { emailStyles as s } from "./components/email-layout";
import type { EmailWording } from "./components/wording";

export interface RequestDeclinedEmailProps {
  shopName: string;
  riderName: string;
  requestNumber: number;
  reason: string;
  statusUrl: string;
  wording?: EmailWording | null;
}

export const subject = ({ requestNumber }: RequestDeclinedEmailProps) => `About your setup request ${requestNumber}`;

export const demoProps: RequestDeclinedEmailProps = {
  shopName: "Sagwise Demo Suspension",
  riderName: "Alex Demo",
  requestNumber: 1042,
  reason: "The fork has been converted to a cartridge we do not service; we can size the shock only.",
  statusUrl: "https://demo.sagwise.test/status/demo-status-token",
};

export function RequestDeclinedEmail(props: RequestDeclinedEmailProps) {
  return (
    <RiderEmail
      shopName={props.shopName}
      riderName={props.riderName}
      preview="We cannot take this request as it stands. The reason is inside."
      heading="We cannot take this request"
      intro={`We looked at your request ${props.requestNumber} and cannot set it up as asked:`}
      requestNumber={props.requestNumber}
      wording={props.wording}
      action={{ label: "See your request", url: props.statusUrl }}
    >
      <Quote>{props.reason}</Quote>
      <Text style={s.paragraph}>Reply to this e-mail or call the shop if you want to talk it through.</Text>
    </RiderEmail>
  );
}

export default RequestDeclinedEmail;
