// Signing in through better-auth's real endpoints (the app's route handler), as a browser would.
import { http, HttpResponse } from "msw";
import type { SetupServer } from "msw/node";
import { POST as authPost, GET as authGet } from "@/app/api/auth/[...all]/route";
import { appBaseUrl, mailBaseUrl } from "@/lib/env";
import { drainOutbox } from "@/lib/mail";
import { fromClient } from "./client";

export const ORIGIN = () => appBaseUrl();

/** `name=value; name2=value2` from a response's Set-Cookie headers. */
export function cookieFrom(response: Response): string {
  return response.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

export async function signInStaff(email: string, password: string): Promise<Response> {
  return authPost(
    new Request(`${ORIGIN()}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: ORIGIN(), ...fromClient() },
      body: JSON.stringify({ email, password }),
    }),
  );
}

/** Captures what the resend SDK posts, so tests can read the e-mails (and their links). */
export function captureMail(server: SetupServer) {
  const sent: { to: string[]; subject: string; html: string; text: string }[] = [];
  server.use(
    http.post(`${mailBaseUrl()}/emails`, async ({ request }) => {
      const body = (await request.json()) as { to: string | string[]; subject: string; html: string; text: string };
      sent.push({ ...body, to: Array.isArray(body.to) ? body.to : [body.to] });
      return HttpResponse.json({ id: `msg_${sent.length}` });
    }),
  );
  return sent;
}

/** Asks for an e-mail link, follows it from the captured e-mail, returns the session cookie. */
export async function signInWithEmailLink(email: string, sent: ReturnType<typeof captureMail>) {
  const asked = await authPost(
    new Request(`${ORIGIN()}/api/auth/sign-in/magic-link`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: ORIGIN(), ...fromClient() },
      body: JSON.stringify({ email, callbackURL: "/my-requests" }),
    }),
  );
  if (asked.status !== 200) throw new Error(`magic link request answered ${asked.status}`);
  // The link is queued in the outbox: send it before reading the captured mail.
  await drainOutbox();
  const message = sent.findLast((m) => m.to.includes(email));
  const link = /href="([^"]*magic-link\/verify[^"]*)"/.exec(message?.html ?? "")?.[1]?.replaceAll("&amp;", "&");
  if (!link) throw new Error("no sign-in link in the captured e-mail");
  const verified = await authGet(new Request(link, { headers: { origin: ORIGIN(), ...fromClient() } }));
  return { link, response: verified, cookie: cookieFrom(verified) };
}
