// The workshop's build sheet of an order, as plain data for the printable page and the PDF: the
// parts to pick (springs with rates and free lengths, the other quote lines), the shop's build
// notes for the bike model (catalog), the figures of the approved sheet, the steps to tick, and who
// built and tested it.
import { findBuildSheetContext } from "@/db/queries/orders";
import { getShopSettings } from "@/db/queries/settings";
import { NotFoundError } from "@/lib/errors";
import { CLICKER_NAMES } from "@/lib/pdf";
import { SERVICE_TYPE_LABELS, type ServiceType } from "./stages";
import { loadOrderView } from "./view";

const STEPS: Record<ServiceType, string[]> = {
  "send-in": [
    "Check the serial numbers against the check-in record",
    "Strip, clean and inspect fork and shock (note wear)",
    "Fit seals, bushings and the parts listed",
    "Fit the springs listed and set preload",
    "Set the fork oil level and bleed the shock as the manufacturer's manual says",
    "Charge the shock with nitrogen to the manual's pressure (licensed practice only)",
    "Set the clickers to the sheet's starting positions",
    "Test on the bench: travel, leaks, damping both ways",
  ],
  kit: [
    "Pick the springs and parts listed",
    "Check spring rates and free lengths against the labels",
    "Build the valving parts as noted",
    "Pack with the setup sheet and the fitting cautions",
  ],
  "springs-only": [
    "Pick the springs listed",
    "Check rates and free lengths against the labels",
    "Pack with the setup sheet",
  ],
};

const fmt = (n: number | null | undefined, digits: number, unit: string) =>
  n === null || n === undefined ? "—" : `${n.toFixed(digits)} ${unit}`;

export async function loadBuildSheet(orderId: string) {
  const [order, context, shop] = await Promise.all([
    loadOrderView(orderId, { staff: true }),
    findBuildSheetContext(orderId),
    getShopSettings(),
  ]);
  if (!context) throw new NotFoundError("No such order.");
  const out = context.output;
  const springs = order.lines.filter((l) => l.spring);
  const parts = order.lines.filter((l) => !l.spring);
  return {
    shopName: shop?.name ?? "Workshop",
    orderNumber: order.number,
    serviceLabel: SERVICE_TYPE_LABELS[order.serviceType],
    riderName: context.riderName,
    requestNumber: context.requestNumber,
    bike: [context.bikeLabel, context.bikeYear].filter(Boolean).join(" "),
    bikeModelId: context.bikeModelId,
    bikeModelName: context.bikeModelName,
    buildNotes: context.buildNotes,
    sheetVersion: context.version,
    springs: springs.map((l) => ({
      what: l.spring!.end === "fork" ? "Fork spring" : "Shock spring",
      quantity: l.quantity,
      rate: fmt(l.spring!.rateNmm, 2, "N/mm"),
      freeLength: fmt(l.spring!.freeLengthMm, 0, "mm"),
    })),
    parts: parts.map((l) => ({ what: l.description, quantity: l.quantity })),
    figures: out
      ? [
          ["Fork spring rate", fmt(out.front.chosenRate?.nMm, 2, "N/mm")],
          ["Fork preload", fmt(out.front.preloadMm, 1, "mm")],
          ["Fork oil level", fmt(out.front.oilLevelMm, 0, "mm")],
          ["Fork race sag target", fmt(out.front.sagTargets.raceSagMm, 0, "mm")],
          ["Shock spring rate", fmt(out.rear.chosenRate.nMm, 2, "N/mm")],
          ["Shock preload", fmt(out.rear.preloadMm, 1, "mm")],
          ["Rear race sag target", fmt(out.rear.sagTargets.raceSagMm, 0, "mm")],
          [
            "Rear static sag window",
            `${out.rear.sagTargets.staticSagMinMm.toFixed(0)}–${out.rear.sagTargets.staticSagMaxMm.toFixed(0)} mm`,
          ],
          ...out.clickers.map((c) => [CLICKER_NAMES[c.id], `${c.position} ${c.unit}`] as [string, string]),
        ]
      : [],
    steps: STEPS[order.serviceType],
    builtBy: order.workshop?.builtBy ?? null,
    testedBy: order.workshop?.testedBy ?? null,
    cautions: [
      "Compressed springs and gas-charged shocks store energy: release preload and pressure as the manufacturer's manual says before opening anything.",
      "Nitrogen charging and shock service only by trained staff following the manual and local rules.",
    ],
  };
}

export type BuildSheet = Awaited<ReturnType<typeof loadBuildSheet>>;
