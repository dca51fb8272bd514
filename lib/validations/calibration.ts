// The admin's calibration buttons: apply the fitted loads to a catalog model, or undo them.
import { z } from "zod";

export const calibrationActionSchema = z.object({
  action: z.enum(["apply", "undo"], { message: "Choose apply or undo" }),
});
export type CalibrationAction = z.infer<typeof calibrationActionSchema>;
