// The shop's one vocabulary: every internal code the app stores (skill, riding style, discipline,
// complaint, clicker, bike class, status, audit action, e-mail template, role…) and the words a
// person reads for it. Pages, e-mails and the setup sheet all take their words from here, so the
// interface says "Cross-country" and "Harsh on small bumps", never `cross-country` or
// `harsh-small-bumps`. Pure data: imported by client components and the server alike.
import type {
  ClickerId,
  Complaint,
  Discipline,
  ForkKind,
  JumpSize,
  RateBasis,
  RidingStyle,
  Severity,
  SkillLevel,
  SuspensionEnd,
  Terrain,
} from "@/lib/sizing";
import { STATUS_LABELS, type RequestStatus } from "@/lib/requests/status";

export { STATUS_LABELS };

export const SKILL_LABELS: Record<SkillLevel, string> = {
  beginner: "Beginner",
  novice: "Novice",
  intermediate: "Intermediate",
  advanced: "Advanced",
  expert: "Expert",
  pro: "Pro",
};

/** The rider picks from the long words; staff pages use the short ones. */
export const STYLE_LABELS: Record<RidingStyle, string> = {
  smooth: "Smooth — flowing, few hard hits",
  moderate: "In between",
  aggressive: "Aggressive — charging, hard landings",
};
export const STYLE_SHORT_LABELS: Record<RidingStyle, string> = {
  smooth: "Smooth",
  moderate: "In between",
  aggressive: "Aggressive",
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

export const CLICKER_LABELS: Record<ClickerId, string> = {
  forkCompression: "Fork compression",
  forkRebound: "Fork rebound",
  shockLowSpeedCompression: "Shock low-speed compression",
  shockHighSpeedCompression: "Shock high-speed compression",
  shockRebound: "Shock rebound",
};

export const FORK_KIND_LABELS: Record<ForkKind, string> = {
  "coil-both": "Coil springs in both legs",
  "coil-single": "Coil spring in one leg",
  air: "Air spring",
};

export const END_LABELS: Record<SuspensionEnd, string> = { front: "Fork", rear: "Shock" };

export const SEVERITY_LABELS: Record<Severity, string> = { info: "Note", caution: "Caution", critical: "Critical" };

/** How the engine finds the ideal spring rate (lib/sizing/README.md, "Model 2"). */
export const RATE_BASIS_LABELS: Record<RateBasis, string> = {
  "ride-frequency": "Ride frequency — same feel as the stock springs for their reference rider",
  "sag-window": "Sag window — meets both race and static sag targets",
};

/** Spring-change triggers of the clicker rules. */
export const RATE_TRIGGER_LABELS: Record<string, string> = {
  "rear-stiffer": "Stiffer shock spring",
  "rear-softer": "Softer shock spring",
  "front-stiffer": "Stiffer fork spring",
  "front-softer": "Softer fork spring",
};

export const ROLE_LABELS: Record<string, string> = { admin: "Admin", tuner: "Tuner", rider: "Rider" };

export const VERSION_STATUS_LABELS: Record<string, string> = {
  draft: "Draft",
  approved: "Approved",
  superseded: "Replaced by a later version",
};

export const SAG_VERDICT_LABELS: Record<"too-soft" | "right" | "too-stiff" | "recheck", string> = {
  "too-soft": "Spring too soft",
  right: "Spring right",
  "too-stiff": "Spring too stiff",
  recheck: "Measure again",
};

/** The generic bike classes the catalog ships (lib/sizing/bike-classes.ts); a shop's own classes show as typed. */
export const BIKE_CLASS_LABELS: Record<string, string> = {
  "mx-450-4t": "450 four-stroke motocross",
  "mx-250-4t": "250 four-stroke motocross",
  "mx-125-2t": "125 two-stroke motocross",
  "enduro-300-2t": "300 two-stroke enduro",
  "youth-85": "85 cc youth",
};

export const EMAIL_TEMPLATE_LABELS: Record<string, string> = {
  "sign-in-link": "sign-in link",
  "staff-invite": "invitation",
  "request-received": "confirmation of the request",
  "tuner-question": "question to the rider",
  "request-declined": "decline notice",
  "sheet-ready": "setup sheet",
  "staff-notice": "notice to the shop",
  "service-reminder": "service reminder",
  "order-stage": "order news",
  "payment-received": "payment receipt",
};

export const STAFF_NOTICE_LABELS: Record<string, string> = {
  "new-request": "New request",
  "rider-answered": "Rider answered",
  "sag-reported": "New sag report",
  "payment-received": "Payment received",
};

/** What each audit action reads as in a request's history. */
export const AUDIT_ACTION_LABELS: Record<string, string> = {
  "request.submitted": "submitted the request",
  "request.status_changed": "changed the status",
  "request.assigned": "changed the assignment",
  "request.review_started": "started the review",
  "request.question_asked": "asked the rider",
  "request.rider_answered": "answered the shop's question",
  "request.declined": "declined the request",
  "recommendation.saved": "saved the recommendation",
  "recommendation.approved": "approved the recommendation",
  "sag.reported": "reported the measured sag",
  "request.notices_seen": "marked the notices seen",
  "calibration.applied": "applied a calibration",
  "calibration.undone": "undid a calibration",
  "email.sent": "e-mail sent:",
  "email.failed": "e-mail FAILED:",
};

/** Dotted paths of the tuner's overrides ("rear.rateNmm", "clickers.forkRebound") in words. */
const OVERRIDE_PART_LABELS: Record<string, string> = {
  rateNmm: "spring rate (N/mm)",
  preloadMm: "preload (mm)",
  raceSagMm: "race sag target (mm)",
  staticSagMinMm: "static sag, lowest (mm)",
  staticSagMaxMm: "static sag, highest (mm)",
  oilLevelMm: "oil level (mm)",
  airPressureKpaGauge: "air pressure (kPa gauge)",
};
export function overrideFieldLabel(path: string): string {
  if (path === "rateBasis") return "Rate basis";
  const [head, tail = ""] = path.split(".");
  if (head === "clickers") return `${labelOf(CLICKER_LABELS, tail)} (clicks)`;
  if (head === "front" || head === "rear") return `${END_LABELS[head]} ${OVERRIDE_PART_LABELS[tail] ?? humanize(tail)}`;
  return humanize(path);
}

/** The words for `value` in `labels`, or a readable form of an unknown code, or "—" for nothing. */
export function labelOf<K extends string>(labels: Record<K, string>, value: unknown): string {
  if (value === null || value === undefined || value === "") return "—";
  if (typeof value === "string" && Object.hasOwn(labels, value)) return labels[value as K];
  return humanize(String(value));
}

/** A code nobody has named yet, made readable: "harsh-small-bumps" → "Harsh small bumps". */
export function humanize(code: string): string {
  const words = code
    .replace(/([a-z0-9])([A-Z])/g, "$1 $2")
    .replace(/[-_.]+/g, " ")
    .trim()
    .toLowerCase();
  return words ? words[0]!.toUpperCase() + words.slice(1) : code;
}

/** Every spelling of a discipline a person or an old row may have ("XC", "cross country", "Cross-Country"). */
export function disciplineLabel(value: unknown): string {
  if (typeof value !== "string") return "—";
  const key = value
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, "-");
  if (key === "xc" || key === "crosscountry") return DISCIPLINE_LABELS["cross-country"];
  return labelOf(DISCIPLINE_LABELS, key);
}

export const statusLabel = (s: unknown) => labelOf<RequestStatus>(STATUS_LABELS, s);
export const skillLabel = (s: unknown) => labelOf(SKILL_LABELS, s);
export const styleLabel = (s: unknown) => labelOf(STYLE_SHORT_LABELS, s);
export const bikeClassLabel = (s: unknown) => labelOf(BIKE_CLASS_LABELS, s);
export const clickerLabel = (s: unknown) => labelOf(CLICKER_LABELS, s);
export const complaintLabel = (s: unknown) => labelOf(COMPLAINT_LABELS, s);
export const roleLabel = (s: unknown) => labelOf(ROLE_LABELS, s);

/** Every code → words table, for the test that no raw code reaches a page or an e-mail. */
export const ALL_LABEL_TABLES = {
  SKILL_LABELS,
  STYLE_LABELS,
  DISCIPLINE_LABELS,
  TERRAIN_LABELS,
  JUMP_LABELS,
  COMPLAINT_LABELS,
  CLICKER_LABELS,
  FORK_KIND_LABELS,
  STATUS_LABELS,
  BIKE_CLASS_LABELS,
  SAG_VERDICT_LABELS,
  RATE_BASIS_LABELS,
} as const;
