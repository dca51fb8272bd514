// The approved setup sheet (first approval, or a revision of an approved one).
import { Text } from "@react-email/components";
import { RiderEmail } from "./components/rider-email";
import { emailStyles as s } from "./components/email-layout";
import type { EmailWording } from "./components/wording";

export interface SheetReadyEmailProps {
  shopName: string;
  riderName: string;
  requestNumber: number;
  version: number;
  tunerName: string;
  /** True when an earlier version was approved before: the rider should use this one instead. */
  revised: boolean;
  sheetUrl: string;
  statusUrl: string;
  wording?: EmailWording | null;
}

export const subject = ({ requestNumber, revised, version }: SheetReadyEmailProps) =>
  revised
    ? `Revised setup sheet (version ${version}) for request ${requestNumber}`
    : `Your setup sheet for request ${requestNumber} is ready`;

export const demoProps: SheetReadyEmailProps = {
  shopName: "Sagwise Demo Suspension",
  riderName: "Alex Demo",
  requestNumber: 1042,
  version: 1,
  tunerName: "Sam Demo",
  revised: false,
  sheetUrl: "https://demo.sagwise.test/api/requests/demo/sheet?version=1&token=demo-status-token",
  statusUrl: "https://demo.sagwise.test/status/demo-status-token",
};

export function SheetReadyEmail(props: SheetReadyEmailProps) {
  return (
    <RiderEmail
      shopName={props.shopName}
      riderName={props.riderName}
      preview={
        props.revised
          ? `Version ${props.version} replaces the sheet you had. Use this one.`
          : "Springs, preload, sag targets and clicker starting points for your bike."
      }
      heading={props.revised ? "Your setup sheet was revised" : "Your setup sheet is ready"}
      intro={
        props.revised
          ? `${props.tunerName} revised the setup for request ${props.requestNumber}. Version ${props.version} replaces the earlier sheet; the earlier versions stay on your request page.`
          : `${props.tunerName} approved the setup for request ${props.requestNumber}. The sheet lists the spring rates, preload, sag targets, oil level and starting clicker positions, with how to measure sag step by step.`
      }
      requestNumber={props.requestNumber}
      wording={props.wording}
      action={{ label: `Download the setup sheet (version ${props.version})`, url: props.sheetUrl }}
      secondary={{ label: "Report your sag", url: props.statusUrl }}
      after={
        <>
          <Text style={s.paragraph}>
            After fitting the springs, measure your static and race sag as the sheet shows (readings A, B and C) and
            report them on your request page, so we can confirm the choice.
          </Text>
          <Text style={s.small}>
            Springs and gas-charged shocks store energy. Work to the manufacturer&apos;s service manual and local rules,
            or have a qualified technician do it, and re-check sag and fasteners before riding.
          </Text>
        </>
      }
    />
  );
}

export default SheetReadyEmail;
