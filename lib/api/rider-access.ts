// Who may act on a request as its rider: the holder of its status token, or the rider signed in
// with the e-mail the request was made with. The check is part of the query (findRequestForViewer).
import { findRequestForViewer, type RiderViewer } from "@/db/queries/status";
import { AuthError, getSessionUser, type SessionUser } from "@/lib/auth/guard";
import { NotFoundError } from "@/lib/errors";
import { isUuid } from "@/lib/validations/id";

/**
 * Whether the caller is the request's rider. 401 when there is neither a token nor a session.
 * `user` saves a second session look-up when the caller already has it.
 */
export async function isRequestRider(
  request: Request,
  requestId: string,
  token: string | undefined,
  user?: SessionUser | null,
): Promise<boolean> {
  let viewer: RiderViewer;
  if (token) viewer = { token };
  else {
    const session = user === undefined ? await getSessionUser(request.headers) : user;
    if (!session) throw new AuthError(401);
    viewer = { email: session.email };
  }
  return isUuid(requestId) && (await findRequestForViewer(viewer, requestId)) !== null;
}

/** The request id when the caller is its rider; otherwise 404, so nothing tells whether it exists. */
export async function requireRiderAccess(request: Request, requestId: string, token: string | undefined) {
  if (!(await isRequestRider(request, requestId, token))) throw new NotFoundError("No such request.");
  return requestId;
}
