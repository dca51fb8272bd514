// better-auth's own endpoints (sign-in, sign-out, magic link, admin). Public on purpose: better-auth
// authenticates and authorises each of them itself, and reads the body itself.
import { route } from "@/lib/api/route";
import { getAuth } from "@/lib/auth/server";

const handle = route({ access: "public" }, async ({ request }) => (await getAuth()).handler(request));

export const GET = handle;
export const POST = handle;
