// The e-mail that carries a rider's (or anyone's) sign-in link, queued in the outbox like every
// other message and sent at once by the worker; better-auth then tells the person "link sent".
import { getDb } from "@/db/client";
import { getShopName } from "@/db/queries/settings";
import { kickOutbox, queueTemplateEmail } from "@/lib/mail";

/** How long an e-mailed sign-in link works. */
export const MAGIC_LINK_MINUTES = 15;

export async function sendSignInLink({ email, url }: { email: string; url: string }): Promise<void> {
  const db = await getDb();
  const shopName = await getShopName();
  await queueTemplateEmail(db, "sign-in-link", { url, expiresInMinutes: MAGIC_LINK_MINUTES, shopName }, { to: email });
  kickOutbox();
}
