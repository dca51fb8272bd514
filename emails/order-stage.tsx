// The rider's order reached a stage the shop tells riders about (shop settings, orders).
import { Text } from "@react-email/components";
import { RiderEmail } from "./components/rider-email";
import { emailStyles as s } from "./components/email-layout";

export interface OrderStageEmailProps {
  shopName: string;
  riderName: string;
  orderNumber: number;
  /** The stage in the rider's words (lib/orders/stages.ts, RIDER_STAGE_WORDS). */
  stageWords: string;
  /** Carrier and tracking number once it has shipped. */
  tracking: string | null;
  statusUrl: string;
}

export const subject = ({ orderNumber, stageWords }: OrderStageEmailProps) => `Order ${orderNumber}: ${stageWords}`;

export const demoProps: OrderStageEmailProps = {
  shopName: "Sagwise Demo Suspension",
  riderName: "Alex Demo",
  orderNumber: 2007,
  stageWords: "On its way to you",
  tracking: "Demo Parcel Service, tracking DEMO123456",
  statusUrl: "https://demo.sagwise.test/status/demo-status-token",
};

export function OrderStageEmail(props: OrderStageEmailProps) {
  return (
    <RiderEmail
      shopName={props.shopName}
      riderName={props.riderName}
      preview={`Order ${props.orderNumber}: ${props.stageWords}`}
      heading={props.stageWords}
      intro={`Your order ${props.orderNumber} has moved on: ${props.stageWords.toLowerCase()}.`}
      action={{ label: "Follow your order", url: props.statusUrl }}
    >
      {props.tracking ? <Text style={s.paragraph}>Shipment: {props.tracking}</Text> : null}
      <Text style={s.paragraph}>The status page shows every step so far.</Text>
    </RiderEmail>
  );
}

export default OrderStageEmail;
