// better-auth's own endpoints (sign-in, sign-out, magic link, admin). Public on purpose: better-auth
// authenticates and authorises each of them itself, and reads the body itself. Every request is
// handed on with the client address we decided on (lib/api/client-address.ts), which better-auth's
// own limiter reads; the sign-in endpoints also pass our limiter, which holds across instances on
// PostgreSQL.
import { withClientHeader } from "@/lib/api/client-address";
import { createLimiter } from "@/lib/api/rate-limit";
import { route } from "@/lib/api/route";
import { getAuth } from "@/lib/auth/server";

// A person mistypes a password a few times; 20 tries per 15 minutes per address stops guessing.
const limitSignIn = createLimiter("sign-in", 20, 15 * 60);
const SIGN_IN_PATHS = ["/sign-in/email", "/sign-in/magic-link", "/magic-link/verify"];

const handle = route({ access: "public" }, async ({ request }) => {
  const { pathname } = new URL(request.url);
  if (SIGN_IN_PATHS.some((p) => pathname.endsWith(p))) await limitSignIn(request);
  return (await getAuth()).handler(withClientHeader(request));
});

export const GET = handle;
export const POST = handle;
