// better-auth's own endpoints (sign-in, sign-out, magic link, admin). Public on purpose: better-auth
// authenticates and authorises each of them itself.
import { getAuth } from "@/lib/auth/server";
import { publicRoute } from "@/lib/auth/guard";

async function handle(request: Request): Promise<Response> {
  const auth = await getAuth();
  return auth.handler(request);
}

export const GET = publicRoute(handle);
export const POST = publicRoute(handle);
