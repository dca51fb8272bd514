// The e-mail that carries a rider's (or anyone's) sign-in link, sent through lib/mail so it is
// recorded in outbound_emails like every other message.
import { getShopName } from "@/db/queries/settings";
import { sendTemplateEmail } from "@/lib/mail";

/** How long an e-mailed sign-in link works. */
export const MAGIC_LINK_MINUTES = 15;

export async function sendSignInLink({ email, url }: { email: string; url: string }): Promise<void> {
  const shopName = await getShopName();
  const outcome = await sendTemplateEmail(
    "sign-in-link",
    { url, expiresInMinutes: MAGIC_LINK_MINUTES, shopName },
    { to: email },
  );
  // better-auth tells the person "link sent"; a failure must not pass silently.
  if (outcome.status !== "sent") throw new Error("The sign-in e-mail could not be sent.");
}
