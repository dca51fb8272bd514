// better-auth's own endpoints (sign-in, sign-out, magic link, admin). Public on purpose: better-auth
// authenticates and authorises each of them itself. Every request is handed on with the client
// address we decided on (lib/api/client-address.ts), which better-auth's own limiter reads; the
// sign-in endpoints also pass our limiter, which holds across instances on PostgreSQL.
import { createLimiter } from "@/lib/api/rate-limit";
import { errorResponse } from "@/lib/api/respond";
import { withClientHeader } from "@/lib/api/client-address";
import { getAuth } from "@/lib/auth/server";
import { publicRoute } from "@/lib/auth/guard";

// A person mistypes a password a few times; 20 tries per 15 minutes per address stops guessing.
const limitSignIn = createLimiter("sign-in", 20, 15 * 60);
const SIGN_IN_PATHS = ["/sign-in/email", "/sign-in/magic-link", "/magic-link/verify"];

async function handle(request: Request): Promise<Response> {
  const { pathname } = new URL(request.url);
  if (SIGN_IN_PATHS.some((p) => pathname.endsWith(p))) {
    try {
      await limitSignIn(request);
    } catch (error) {
      return errorResponse(error);
    }
  }
  const auth = await getAuth();
  return auth.handler(withClientHeader(request));
}

export const GET = publicRoute(handle);
export const POST = publicRoute(handle);
