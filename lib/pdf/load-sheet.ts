// Builds the sheet's data from the database: the stored version's output, approval time and
// approver (never the clock), the request as the rider answered it, and the shop's settings.
import { z } from "zod";
import { getShopSettings } from "@/db/queries/settings";
import type { findSheetRequest, findSheetVersion } from "@/db/queries/sheet";
import { recommendationSchema } from "@/lib/sizing";
import { ensureSheetReportUrl } from "./report-link";
import { paperSizeOf, type SheetData } from "./sheet-data";

type SheetRequestRow = NonNullable<Awaited<ReturnType<typeof findSheetRequest>>>;
type SheetVersionRow = NonNullable<Awaited<ReturnType<typeof findSheetVersion>>>;

// Only what the sheet prints from the answers; the rest of the answers is not needed here.
const answersForSheetSchema = z.object({
  rider: z.object({
    weight: z.object({ value: z.number(), unit: z.enum(["kg", "lb"]) }),
    gearIncluded: z.boolean(),
  }),
});

export async function buildSheetData(
  request: SheetRequestRow,
  version: SheetVersionRow,
  options: { draft: boolean },
): Promise<SheetData> {
  const settings = await getShopSettings();
  const answers = answersForSheetSchema.safeParse(request.answers);
  const recommendation = recommendationSchema.parse(version.output);
  return {
    shop: {
      name: settings?.name ?? "Your suspension shop",
      email: settings?.email ?? "",
      phone: settings?.phone ?? null,
      address: settings?.address ?? null,
      website: settings?.website ?? null,
      imperial: settings?.units === "imperial",
      paperSize: paperSizeOf(settings?.paperSize),
      footer: settings?.sheetFooter ?? null,
    },
    request: {
      number: request.number,
      riderName: request.riderName,
      bikeLabel: request.bikeLabel,
      bikeYear: request.bikeYear,
      discipline: request.discipline,
      skill: request.skill,
      riderWeight: answers.success ? answers.data.rider.weight : null,
      gearIncluded: answers.success ? answers.data.rider.gearIncluded : null,
      forkOil: { type: request.forkOilType, volumeMlPerLeg: request.forkOilVolumeMl },
    },
    version: {
      number: version.version,
      state: version.state,
      approvedAt: version.approvedAt,
      approverName: version.approverName,
      notesForRider: version.notesForRider,
      updatedAt: version.updatedAt,
    },
    recommendation,
    // A draft preview carries no live link: the link is minted only for a sheet the rider may use.
    reportUrl: options.draft ? null : await ensureSheetReportUrl(request.id),
    draft: options.draft,
  };
}
