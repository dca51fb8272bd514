// Who may act on a request from the status page: the holder of its status token, or the rider
// signed in with the e-mail the request was made with. The check is part of the query.
import { findRequestForViewer, type RiderViewer } from "@/db/queries/status";
import { HttpError } from "@/lib/api/respond";
import { AuthError, getSessionUser } from "@/lib/auth/guard";

export async function requireRiderAccess(request: Request, requestId: string, token: string | undefined) {
  let viewer: RiderViewer;
  if (token) viewer = { token };
  else {
    const user = await getSessionUser(request.headers);
    if (!user) throw new AuthError(401);
    viewer = { email: user.email };
  }
  const ok = /^[0-9a-f-]{36}$/i.test(requestId) ? await findRequestForViewer(viewer, requestId) : null;
  if (!ok) throw new HttpError(404, "No such request.");
  return ok;
}
