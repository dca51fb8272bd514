// Words the rider reads for each answer value (the stored values stay the engine's vocabulary).
import type { Complaint, Discipline, JumpSize, RateBasis, RidingStyle, SkillLevel, Terrain } from "@/lib/sizing";

export const SKILL_LABELS: Record<SkillLevel, string> = {
  beginner: "Beginner",
  novice: "Novice",
  intermediate: "Intermediate",
  advanced: "Advanced",
  expert: "Expert",
  pro: "Pro",
};

export const STYLE_LABELS: Record<RidingStyle, string> = {
  smooth: "Smooth — flowing, few hard hits",
  moderate: "In between",
  aggressive: "Aggressive — charging, hard landings",
};

export const DISCIPLINE_LABELS: Record<Discipline, string> = {
  motocross: "Motocross",
  supercross: "Supercross",
  enduro: "Enduro",
  "cross-country": "Cross-country",
  desert: "Desert",
  trail: "Trail",
};

export const TERRAIN_LABELS: Record<Terrain, string> = {
  sand: "Sand",
  loam: "Loam",
  hardpack: "Hardpack",
  rocky: "Rocky",
  roots: "Roots",
  mud: "Mud",
};

export const JUMP_LABELS: Record<JumpSize, string> = {
  none: "No jumps",
  small: "Small (under 10 m)",
  medium: "Medium (10–20 m)",
  large: "Large (over 20 m)",
};

export const COMPLAINT_LABELS: Record<Complaint, string> = {
  bottoming: "Bottoms out",
  "harsh-small-bumps": "Harsh on small bumps",
  "dives-braking": "Dives under braking",
  wallows: "Wallows, feels vague",
  kicks: "Kicks or bucks",
  headshake: "Headshake",
  "rides-low": "Rides low in the stroke",
  "rides-high": "Rides high, feels stiff",
};

export const label = <K extends string>(labels: Record<K, string>, value: unknown): string =>
  typeof value === "string" && value in labels ? labels[value as K] : String(value ?? "—");

/** How the engine finds the ideal spring rate (lib/sizing/README.md, "Model 2"). */
export const RATE_BASIS_LABELS: Record<RateBasis, string> = {
  "ride-frequency": "Ride frequency — same feel as the stock springs for their reference rider",
  "sag-window": "Sag window — meets both race and static sag targets",
};
