// Confirmation after a rider submits a setup request, with the private status link.
import { Text } from "@react-email/components";
import { RiderEmail } from "./components/rider-email";
import { emailStyles as s } from "./components/email-layout";
import type { EmailWording } from "./components/wording";

export interface RequestReceivedEmailProps {
  shopName: string;
  riderName: string;
  requestNumber: number;
  bikeLabel: string;
  statusUrl: string;
  wording?: EmailWording | null;
}

export const subject = ({ shopName, requestNumber }: RequestReceivedEmailProps) =>
  `${shopName} received your setup request ${requestNumber}`;

export const demoProps: RequestReceivedEmailProps = {
  shopName: "Sagwise Demo Suspension",
  riderName: "Alex Demo",
  requestNumber: 1042,
  bikeLabel: "450 four-stroke motocross (typical values)",
  statusUrl: "https://demo.sagwise.test/status/demo-status-token",
};

export function RequestReceivedEmail(props: RequestReceivedEmailProps) {
  return (
    <RiderEmail
      shopName={props.shopName}
      riderName={props.riderName}
      preview={`Request ${props.requestNumber} is in. Follow it with your private link.`}
      heading="Your setup request is in"
      intro={`We have your request ${props.requestNumber} for the ${props.bikeLabel}. A tuner will check the proposed springs and settings against your answers, and may ask you a question first.`}
      requestNumber={props.requestNumber}
      wording={props.wording}
      action={{ label: "Follow your request", url: props.statusUrl }}
    >
      <Text style={s.paragraph}>
        The link below shows where your request stands. When the setup sheet is approved you can download it there, and
        later report the sag you measure.
      </Text>
    </RiderEmail>
  );
}

export default RequestReceivedEmail;
