// Rider sign-in by e-mail (better-auth magic link): one button, the plain address as a fallback.
import { Button, Heading, Text } from "@react-email/components";
import { EmailLayout, emailStyles as s } from "./components/email-layout";

export interface SignInLinkEmailProps {
  url: string;
  expiresInMinutes: number;
  shopName: string;
}

export function subject({ shopName }: SignInLinkEmailProps): string {
  return `Your sign-in link for ${shopName}`;
}

export const demoProps: SignInLinkEmailProps = {
  url: "https://demo.sagwise.test/api/auth/magic-link/verify?token=demo-token-1234",
  expiresInMinutes: 15,
  shopName: "Sagwise Demo Suspension",
};

export function SignInLinkEmail({ url, expiresInMinutes, shopName }: SignInLinkEmailProps) {
  const minutes = `${expiresInMinutes} minute${expiresInMinutes === 1 ? "" : "s"}`;
  return (
    <EmailLayout
      shopName={shopName}
      preview={`Tap to see your setup requests. The link works for ${minutes}.`}
      reason="You get this e-mail because someone asked for a sign-in link with this address. If it was not you, ignore it: nobody can sign in without the link."
    >
      <Heading as="h1" style={s.heading}>
        Sign in to see your setup requests
      </Heading>
      <Text style={s.paragraph}>
        Tap the button to open your requests at {shopName}: their status, the tuner&apos;s questions and your approved
        setup sheets.
      </Text>
      <Text style={s.paragraph}>
        <Button href={url} style={s.button}>
          Sign in
        </Button>
      </Text>
      <Text style={s.small}>
        The link can be used once and stops working after {minutes}. If the button does nothing, copy this address into
        your browser:
      </Text>
      <Text style={s.urlText}>{url}</Text>
    </EmailLayout>
  );
}

export default SignInLinkEmail;
