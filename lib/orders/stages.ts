// The order's vocabulary: service types, workshop stages and their legal moves, payment states.
// The ids are a contract (API, database, tests); the words people read are in ORDER_LABELS.
// No server imports: the board and the status page use it in the browser too.

export const SERVICE_TYPES = ["send-in", "kit", "springs-only"] as const;
export type ServiceType = (typeof SERVICE_TYPES)[number];

export const ORDER_STAGES = [
  "awaiting_parts",
  "received",
  "in_work",
  "at_finisher",
  "assembled",
  "shipped",
  "closed",
] as const;
export type OrderStage = (typeof ORDER_STAGES)[number];

export const PAYMENT_STATUSES = ["unpaid", "deposit", "paid", "refunded"] as const;
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];

export const PRICE_KINDS = ["service", "spring", "part", "shipping"] as const;
export type PriceKind = (typeof PRICE_KINDS)[number];

/**
 * Legal stage moves. Parts arrive (or a kit's parts come in from the supplier) and are checked in;
 * work starts; a part may go out to a finisher and come back to the bench; the build is assembled and
 * tested, may go back for rework, ships, and the order closes. Kits and springs-only orders have
 * nothing to check in and may start work straight from awaiting parts.
 */
const MOVES: Record<OrderStage, readonly OrderStage[]> = {
  awaiting_parts: ["received", "in_work"],
  received: ["in_work"],
  in_work: ["at_finisher", "assembled"],
  at_finisher: ["in_work"],
  assembled: ["in_work", "shipped"],
  shipped: ["closed"],
  closed: [],
};

export function canMove(from: OrderStage, to: OrderStage, serviceType: ServiceType): boolean {
  // Send-in parts are checked in before work starts; kits and springs have nothing to check in.
  if (from === "awaiting_parts" && to === "in_work" && serviceType === "send-in") return false;
  if (to === "received" && serviceType !== "send-in") return false;
  return MOVES[from].includes(to);
}

export function nextStages(from: OrderStage, serviceType: ServiceType): OrderStage[] {
  return ORDER_STAGES.filter((to) => canMove(from, to, serviceType));
}

export const STAGE_LABELS: Record<OrderStage, string> = {
  awaiting_parts: "Waiting for parts",
  received: "Checked in",
  in_work: "On the bench",
  at_finisher: "Out at a finisher",
  assembled: "Built and tested",
  shipped: "On its way back",
  closed: "Done",
};

/** The same stages as the rider reads them on the status page and in e-mails. */
export const RIDER_STAGE_WORDS: Record<OrderStage, string> = {
  awaiting_parts: "We are waiting for your parts to reach us",
  received: "Your parts have arrived and are checked in",
  in_work: "A tuner is working on your suspension",
  at_finisher: "A part is out for finishing work",
  assembled: "Built, tested and ready to ship",
  shipped: "On its way to you",
  closed: "Order complete",
};

export const SERVICE_TYPE_LABELS: Record<ServiceType, string> = {
  "send-in": "Send-in rebuild",
  kit: "Kit built to order",
  "springs-only": "Springs only",
};

export const PAYMENT_STATUS_LABELS: Record<PaymentStatus, string> = {
  unpaid: "Not paid yet",
  deposit: "Deposit paid",
  paid: "Paid",
  refunded: "Refunded",
};

export const PRICE_KIND_LABELS: Record<PriceKind, string> = {
  service: "Service",
  spring: "Spring",
  part: "Part",
  shipping: "Shipping",
};

export const isOrderStage = (v: unknown): v is OrderStage =>
  typeof v === "string" && (ORDER_STAGES as readonly string[]).includes(v);
