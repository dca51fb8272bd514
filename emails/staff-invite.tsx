// Invitation to the shop workspace, sent when an admin adds a tuner or another admin.
import { Button, Heading, Text } from "@react-email/components";
import { EmailLayout, emailStyles as s } from "./components/email-layout";

export type StaffRole = "tuner" | "admin";

export interface StaffInviteEmailProps {
  url: string;
  role: StaffRole;
  inviterName: string;
  shopName: string;
}

const ROLE_WORK: Record<StaffRole, string> = {
  tuner:
    "work the request queue, review and adjust the proposed springs, ask riders questions and approve setup sheets, and keep the bike catalog and spring stock current",
  admin: "do everything a tuner does, and also manage the team, the shop settings and the setup targets",
};

export function subject({ inviterName, shopName }: StaffInviteEmailProps): string {
  return `${inviterName} invited you to the ${shopName} workspace`;
}

export const demoProps: StaffInviteEmailProps = {
  url: "https://demo.sagwise.test/invite/demo-invite-5678",
  role: "tuner",
  inviterName: "Alex Demo",
  shopName: "Sagwise Demo Suspension",
};

export function StaffInviteEmail({ url, role, inviterName, shopName }: StaffInviteEmailProps) {
  return (
    <EmailLayout
      shopName={shopName}
      preview={`Join ${shopName} on Sagwise as ${role === "admin" ? "an admin" : "a tuner"}.`}
      reason={`You get this e-mail because ${inviterName} entered this address in the ${shopName} team list. If you do not expect it, ignore it and no account is made.`}
    >
      <Heading as="h1" style={s.heading}>
        You are invited as {role === "admin" ? "an admin" : "a tuner"}
      </Heading>
      <Text style={s.paragraph}>
        {inviterName} has added you to the {shopName} workspace. As {role === "admin" ? "an admin" : "a tuner"} you can{" "}
        {ROLE_WORK[role]}.
      </Text>
      <Text style={s.paragraph}>
        <Button href={url} style={s.button}>
          Accept and set a password
        </Button>
      </Text>
      <Text style={s.small}>If the button does nothing, copy this address into your browser:</Text>
      <Text style={s.urlText}>{url}</Text>
    </EmailLayout>
  );
}

export default StaffInviteEmail;
