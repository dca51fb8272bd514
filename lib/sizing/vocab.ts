import { z } from "zod";

// Shared vocabulary: forms, the database and the engine all reuse these enums, so a value
// accepted by the request form is always one the engine understands.

export const disciplineSchema = z.enum(["motocross", "supercross", "enduro", "cross-country", "desert", "trail"]);
export type Discipline = z.infer<typeof disciplineSchema>;
export const DISCIPLINES = disciplineSchema.options;

export const skillLevelSchema = z.enum(["beginner", "novice", "intermediate", "advanced", "expert", "pro"]);
export type SkillLevel = z.infer<typeof skillLevelSchema>;
export const SKILL_LEVELS = skillLevelSchema.options;

export const ridingStyleSchema = z.enum(["smooth", "moderate", "aggressive"]);
export type RidingStyle = z.infer<typeof ridingStyleSchema>;
export const RIDING_STYLES = ridingStyleSchema.options;

export const terrainSchema = z.enum(["sand", "loam", "hardpack", "rocky", "roots", "mud"]);
export type Terrain = z.infer<typeof terrainSchema>;
export const TERRAINS = terrainSchema.options;

export const complaintSchema = z.enum([
  "bottoming",
  "harsh-small-bumps",
  "dives-braking",
  "wallows",
  "kicks",
  "headshake",
  "rides-low",
  "rides-high",
]);
export type Complaint = z.infer<typeof complaintSchema>;
export const COMPLAINTS = complaintSchema.options;

export const forkKindSchema = z.enum(["coil-both", "coil-single", "air"]);
export type ForkKind = z.infer<typeof forkKindSchema>;
export const FORK_KINDS = forkKindSchema.options;

export const rateUnitSchema = z.enum(["N/mm", "kgf/mm", "lbf/in"]);
export type RateUnit = z.infer<typeof rateUnitSchema>;
export const RATE_UNITS = rateUnitSchema.options;

export const jumpSizeSchema = z.enum(["none", "small", "medium", "large"]);
export type JumpSize = z.infer<typeof jumpSizeSchema>;
export const JUMP_SIZES = jumpSizeSchema.options;

/** Damping adjusters, each counted out from fully closed (clicks, or turns for shock high-speed). */
export const clickerIdSchema = z.enum([
  "forkCompression",
  "forkRebound",
  "shockLowSpeedCompression",
  "shockHighSpeedCompression",
  "shockRebound",
]);
export type ClickerId = z.infer<typeof clickerIdSchema>;
export const CLICKER_IDS = clickerIdSchema.options;

export const severitySchema = z.enum(["info", "caution", "critical"]);
export type Severity = z.infer<typeof severitySchema>;

export const suspensionEndSchema = z.enum(["front", "rear"]);
export type SuspensionEnd = z.infer<typeof suspensionEndSchema>;

/** "ride-frequency": the stock setup's natural frequency for the reference rider, matched for this
 *  rider; "sag-window": the rate that meets both race and static sag targets (lib/sizing/README.md). */
export const rateBasisSchema = z.enum(["ride-frequency", "sag-window"]);
export type RateBasis = z.infer<typeof rateBasisSchema>;
export const RATE_BASES = rateBasisSchema.options;
