// A service falls due (or is overdue): what, when, and a link to start a new request with the
// rider's bike already chosen. Sent once per service and due date by the reminder job.
import { Text } from "@react-email/components";
import { RiderEmail } from "./components/rider-email";
import { emailStyles as s } from "./components/email-layout";

export interface ServiceReminderEmailProps {
  shopName: string;
  riderName: string;
  bikeLabel: string;
  /** Each service due, with its day already written for people ("14 Dec 2026") and whether it is past. */
  services: { label: string; dueDay: string; overdue: boolean }[];
  /** A new request with the bike chosen. */
  url: string;
  statusUrl: string;
}

export const subject = ({ services, bikeLabel }: ServiceReminderEmailProps) =>
  services.length === 1
    ? `${services[0]!.label} due for your ${bikeLabel}`
    : `${services.length} services due for your ${bikeLabel}`;

export const demoProps: ServiceReminderEmailProps = {
  shopName: "Sagwise Demo Suspension",
  riderName: "Alex Demo",
  bikeLabel: "Generic 450 four-stroke motocrosser",
  services: [
    { label: "Fork oil change", dueDay: "14 Dec 2026", overdue: false },
    { label: "Shock service (oil and gas)", dueDay: "28 Nov 2026", overdue: true },
  ],
  url: "https://demo.sagwise.test/request?bike=00000000-0000-4000-8000-000000000000",
  statusUrl: "https://demo.sagwise.test/status/demo-status-token",
};

export function ServiceReminderEmail(props: ServiceReminderEmailProps) {
  return (
    <RiderEmail
      shopName={props.shopName}
      riderName={props.riderName}
      preview={`Service reminder for your ${props.bikeLabel}, from the hours you ride.`}
      heading="Your suspension is due for a service"
      intro={`From the hours you ride, your ${props.bikeLabel} is coming up for:`}
      action={{ label: "Book it: start a request for this bike", url: props.url }}
      secondary={{ label: "Log your hours", url: props.statusUrl }}
      after={
        <>
          <Text style={s.paragraph}>Log the hours you ride on your request page, and the dates move with them.</Text>
          <Text style={s.small}>
            These dates are our estimate from common practice and the hours you gave us, not your bike maker&apos;s
            figures: the manufacturer&apos;s service manual comes first. Forks and gas-charged shocks hold pressure and
            spring force; have a qualified technician open them.
          </Text>
        </>
      }
    >
      {props.services.map((service) => (
        <Text key={service.label} style={{ ...s.paragraph, margin: "0 0 8px", paddingLeft: "12px" }}>
          <strong>{service.label}</strong>
          <br />
          {service.overdue ? `overdue since ${service.dueDay}` : `due ${service.dueDay}`}
        </Text>
      ))}
    </RiderEmail>
  );
}

export default ServiceReminderEmail;
