// Shared frame of every Sagwise e-mail: the shop's name on top, one column that reads on a phone,
// a plain footer. System fonts only and no images, so nothing is fetched when the mail is opened.
import { Body, Container, Head, Hr, Html, Preview, Section, Text } from "@react-email/components";
import type { CSSProperties, ReactNode } from "react";

const FONT = '-apple-system, BlinkMacSystemFont, "Segoe UI", Roboto, Helvetica, Arial, sans-serif';

export const emailStyles = {
  body: { backgroundColor: "#f1f2ee", margin: 0, padding: "24px 0", fontFamily: FONT, color: "#1d2327" },
  container: {
    maxWidth: "560px",
    margin: "0 auto",
    backgroundColor: "#ffffff",
    border: "1px solid #d9ddd3",
    borderRadius: "8px",
  },
  header: { padding: "18px 24px 14px", borderBottom: "3px solid #2f6b4f" },
  shopName: { fontSize: "18px", lineHeight: "24px", fontWeight: 700, margin: 0, color: "#1d2327" },
  shopTag: { fontSize: "12px", lineHeight: "16px", margin: "2px 0 0", color: "#5b665f", letterSpacing: "0.04em" },
  content: { padding: "8px 24px 4px" },
  heading: { fontSize: "20px", lineHeight: "28px", fontWeight: 700, margin: "16px 0 8px" },
  paragraph: { fontSize: "16px", lineHeight: "24px", margin: "0 0 14px" },
  small: { fontSize: "13px", lineHeight: "20px", color: "#5b665f", margin: "0 0 12px" },
  button: {
    display: "inline-block",
    backgroundColor: "#2f6b4f",
    color: "#ffffff",
    fontSize: "16px",
    fontWeight: 600,
    textDecoration: "none",
    borderRadius: "6px",
    padding: "12px 18px",
    maxWidth: "100%",
    boxSizing: "border-box",
  },
  buttonSecondary: {
    display: "inline-block",
    backgroundColor: "#ffffff",
    color: "#1f4d38",
    border: "2px solid #2f6b4f",
    fontSize: "16px",
    fontWeight: 600,
    textDecoration: "none",
    borderRadius: "6px",
    padding: "10px 16px",
    maxWidth: "100%",
    boxSizing: "border-box",
  },
  urlText: { fontSize: "13px", lineHeight: "20px", color: "#1f5c8a", wordBreak: "break-all", margin: "0 0 14px" },
  footer: { padding: "0 24px 18px" },
  footerText: { fontSize: "12px", lineHeight: "18px", color: "#6b746d", margin: "0 0 6px" },
} satisfies Record<string, CSSProperties>;

export interface EmailLayoutProps {
  shopName: string;
  /** Inbox preview line shown next to the subject. */
  preview: string;
  /** Why the reader gets this e-mail, in the footer. */
  reason: string;
  children: ReactNode;
}

export function EmailLayout({ shopName, preview, reason, children }: EmailLayoutProps) {
  return (
    <Html lang="en">
      <Head>
        <meta name="color-scheme" content="light" />
      </Head>
      <Preview>{preview}</Preview>
      <Body style={emailStyles.body}>
        <Container style={emailStyles.container}>
          <Section style={emailStyles.header}>
            <Text style={emailStyles.shopName}>{shopName}</Text>
            <Text style={emailStyles.shopTag}>Suspension setup</Text>
          </Section>
          <Section style={emailStyles.content}>{children}</Section>
          <Section style={emailStyles.footer}>
            <Hr style={{ borderColor: "#e3e6de", margin: "8px 0 14px" }} />
            <Text style={emailStyles.footerText}>{reason}</Text>
            <Text style={emailStyles.footerText}>{shopName} · sent with Sagwise</Text>
          </Section>
        </Container>
      </Body>
    </Html>
  );
}
