// GET /api/shop/catalog/[id]/calibration (admin): the model's sag reports fitted by the engine,
// `{ reports, fit: null | { parameters, residualsMm, rmsBeforeMm, rmsAfterMm }, applied }` plus the
// refusal reason, the catalog's parameters and the active calibration.
// POST { action: "apply" | "undo" } (admin): apply the current fit to new recommendations, or undo
// it; 409 when there is nothing to apply or undo, or the fit refuses.
import { NextResponse } from "next/server";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { applyCalibration, getCalibrationSummary, undoCalibration } from "@/lib/calibration/service";
import { calibrationActionSchema } from "@/lib/validations/calibration";
import { jsonBody, uuidParam, type IdContext } from "../../../_lib/body";

export const dynamic = "force-dynamic";

export const GET = withErrors(async (request: Request, { params }: IdContext) => {
  await requireRole(["admin"], { headers: request.headers });
  return NextResponse.json(await getCalibrationSummary(await uuidParam(params, "bike model")));
});

export const POST = withErrors(async (request: Request, { params }: IdContext) => {
  const user = await requireRole(["admin"], { headers: request.headers });
  const id = await uuidParam(params, "bike model");
  const { action } = calibrationActionSchema.parse(await jsonBody(request));
  const result = action === "apply" ? await applyCalibration(id, user) : await undoCalibration(id, user);
  return NextResponse.json({ action, calibration: result, ...(await getCalibrationSummary(id)) });
});
