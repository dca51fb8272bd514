// A tuner's question about a request; the rider answers on the status page.
import { Text } from "@react-email/components";
import { Quote, RiderEmail } from "./components/rider-email";
import { emailStyles as s } from "./components/email-layout";
import type { EmailWording } from "./components/wording";

export interface TunerQuestionEmailProps {
  shopName: string;
  riderName: string;
  requestNumber: number;
  tunerName: string;
  question: string;
  statusUrl: string;
  wording?: EmailWording | null;
}

export const subject = ({ requestNumber }: TunerQuestionEmailProps) =>
  `A question about your setup request ${requestNumber}`;

export const demoProps: TunerQuestionEmailProps = {
  shopName: "Sagwise Demo Suspension",
  riderName: "Alex Demo",
  requestNumber: 1042,
  tunerName: "Sam Demo",
  question: "Is the shock linkage original, or has a lowering link been fitted?",
  statusUrl: "https://demo.sagwise.test/status/demo-status-token",
};

export function TunerQuestionEmail(props: TunerQuestionEmailProps) {
  return (
    <RiderEmail
      shopName={props.shopName}
      riderName={props.riderName}
      preview={`${props.tunerName} needs one more detail before sizing your springs.`}
      heading="The shop has a question"
      intro={`${props.tunerName} is working on your request ${props.requestNumber} and asks:`}
      requestNumber={props.requestNumber}
      wording={props.wording}
      action={{ label: "Answer the question", url: props.statusUrl }}
    >
      <Quote>{props.question}</Quote>
      <Text style={s.paragraph}>Answer on your request page; the work continues as soon as you do.</Text>
    </RiderEmail>
  );
}

export default TunerQuestionEmail;
