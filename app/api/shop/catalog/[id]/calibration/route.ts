// GET /api/shop/catalog/[id]/calibration (admin): the model's sag reports fitted by the engine,
// `{ reports, fit: null | { parameters, residualsMm, rmsBeforeMm, rmsAfterMm }, applied }` plus the
// refusal reason, the catalog's parameters and the active calibration.
// POST { action: "apply" | "undo" } (admin): apply the current fit to new recommendations, or undo
// it; 409 when there is nothing to apply or undo, or the fit refuses.
import { idParams, json, route } from "@/lib/api/route";
import { applyCalibration, getCalibrationSummary, undoCalibration } from "@/lib/calibration/service";
import { calibrationActionSchema } from "@/lib/validations/calibration";

export const dynamic = "force-dynamic";

export const GET = route(
  { access: ["admin"], params: idParams, notFound: "No such bike model." },
  async ({ params: { id } }) => json(await getCalibrationSummary(id)),
);

export const POST = route(
  { access: ["admin"], params: idParams, notFound: "No such bike model.", body: calibrationActionSchema },
  async ({ user, params: { id }, body: { action } }) => {
    const result = action === "apply" ? await applyCalibration(id, user) : await undoCalibration(id, user);
    return json({ action, calibration: result, ...(await getCalibrationSummary(id)) });
  },
);
