// Who may open an order: staff, or the rider of the order's request (status token or own session,
// as lib/api/rider-access.ts checks). Anyone else is told there is no such order (404).
import { findOrder } from "@/db/queries/orders";
import { getSessionUser } from "@/lib/auth/guard";
import { isStaff } from "@/lib/auth/roles";
import { NotFoundError } from "@/lib/errors";
import type { OrderActor } from "@/lib/orders/notify";
import { isRequestRider } from "./rider-access";

export async function requireOrderAccess(request: Request, orderId: string, token: string | undefined) {
  const user = await getSessionUser(request.headers);
  const staff = user !== null && isStaff(user.role);
  const order = await findOrder(orderId);
  if (staff) {
    if (!order) throw new NotFoundError("No such order.");
    return { order, staff, actor: { userId: user.id, label: user.name } satisfies OrderActor };
  }
  const rider = await isRequestRider(request, order?.requestId ?? orderId, token, user);
  if (!order || !rider) throw new NotFoundError("No such order.");
  return { order, staff, actor: { userId: null, label: "rider" } satisfies OrderActor };
}

/** Staff open any request; a rider only their own (token or session). */
export async function requireRequestAccess(request: Request, requestId: string, token: string | undefined) {
  const user = await getSessionUser(request.headers);
  if (user !== null && isStaff(user.role)) return { staff: true, actor: { userId: user.id, label: user.name } };
  if (!(await isRequestRider(request, requestId, token, user))) throw new NotFoundError("No such request.");
  return { staff: false, actor: { userId: null, label: "rider" } satisfies OrderActor };
}
