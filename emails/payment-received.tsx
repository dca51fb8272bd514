// The payment service confirmed the rider's payment for an order.
import { Text } from "@react-email/components";
import { RiderEmail } from "./components/rider-email";
import { emailStyles as s } from "./components/email-layout";

export interface PaymentReceivedEmailProps {
  shopName: string;
  riderName: string;
  orderNumber: number;
  /** Written with lib/format's formatMoney: "€123.45". */
  amount: string;
  /** What is still open after this payment, or null when the order is paid in full. */
  remaining: string | null;
  statusUrl: string;
}

export const subject = ({ orderNumber }: PaymentReceivedEmailProps) => `Payment received for order ${orderNumber}`;

export const demoProps: PaymentReceivedEmailProps = {
  shopName: "Sagwise Demo Suspension",
  riderName: "Alex Demo",
  orderNumber: 2007,
  amount: "€248.00",
  remaining: null,
  statusUrl: "https://demo.sagwise.test/status/demo-status-token",
};

export function PaymentReceivedEmail(props: PaymentReceivedEmailProps) {
  return (
    <RiderEmail
      shopName={props.shopName}
      riderName={props.riderName}
      preview={`We received ${props.amount} for order ${props.orderNumber}.`}
      heading="Payment received"
      intro={`Thank you: we received ${props.amount} for order ${props.orderNumber}.`}
      action={{ label: "See your order", url: props.statusUrl }}
    >
      <Text style={s.paragraph}>
        {props.remaining ? `Still to pay before we ship: ${props.remaining}.` : "The order is paid in full."}
      </Text>
    </RiderEmail>
  );
}

export default PaymentReceivedEmail;
