// The invented demo scenario: an invented shop, its invented staff and riders. Any likeness to a
// real shop or person is accidental. Bikes come from the engine's generic classes (typical values).
import { createHash } from "node:crypto";
import type { RequestStatus } from "@/db/schema";
import type { RequestAnswersInput } from "@/lib/validations/request";

/** A uuid derived from a name, so a demo row has the same id on every run. Kept here, beside the
 * scenario and free of database imports, so the browser tests can name the seeded rows too. */
export function stableUuid(name: string): string {
  const h = createHash("sha256").update(`sagwise-demo:${name}`).digest("hex");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-4${h.slice(13, 16)}-8${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

export const DEMO_SHOP = {
  name: "Cinderline Suspension (demo)",
  email: "workshop@cinderline.test",
  phone: "+1 555 0100",
  address: "14 Gravel Pit Road, Demo Valley",
  website: "https://cinderline.test",
  units: "metric",
  paperSize: "A4",
  sheetFooter: "Demo shop: every figure on this sheet comes from an invented scenario.",
  gearMassKg: 8,
} as const;

export const DEMO_STAFF = [
  { email: "owner@sagwise.test", name: "Mara Quillfeather", role: "admin" },
  { email: "tuner@sagwise.test", name: "Teo Brambleton", role: "tuner" },
  { email: "tuner2@sagwise.test", name: "Ines Harrowgate", role: "tuner" },
] as const;

export interface DemoRequest {
  key: string;
  status: RequestStatus;
  daysAgo: number;
  bikeClass: string;
  tuner?: "tuner@sagwise.test" | "tuner2@sagwise.test";
  question?: string;
  answer?: string;
  declineReason?: string;
  /** The rider reported sag this many days after approval (readings: DEMO_CALIBRATION_TRUTH). */
  sagReportDaysAfter?: number;
  answers: RequestAnswersInput;
}

type Rider = RequestAnswersInput["rider"];
type Riding = RequestAnswersInput["riding"];
type Feel = RequestAnswersInput["feel"];

function request(
  key: string,
  status: RequestStatus,
  daysAgo: number,
  bikeClass: string,
  rider: Rider,
  riding: Riding,
  feel: Feel,
  extra: Partial<DemoRequest> & { year?: number } = {},
): DemoRequest {
  const { year, ...rest } = extra;
  return {
    key,
    status,
    daysAgo,
    bikeClass,
    answers: {
      rider,
      riding,
      // modelId is filled in from the seeded catalog.
      bike: { modelId: null, year: year ?? 2024 },
      feel,
      review: { consent: true },
    },
    ...rest,
  };
}

const kg = (value: number) => ({ value, unit: "kg" as const });
const lb = (value: number) => ({ value, unit: "lb" as const });

export const DEMO_REQUESTS: DemoRequest[] = [
  request(
    "r01",
    "submitted",
    0,
    "mx-450-4t",
    {
      name: "Jesper Dunmore",
      email: "jesper.dunmore@example.test",
      weight: kg(92),
      gearIncluded: false,
      skill: "intermediate",
      style: "aggressive",
    },
    { discipline: "motocross", terrain: ["hardpack", "loam"], jumpSize: "large", hoursPerMonth: 12 },
    { complaints: ["bottoming", "dives-braking"], notes: "Bottoms the rear on the big double at my home track." },
  ),
  request(
    "r02",
    "submitted",
    1,
    "enduro-300-2t",
    {
      name: "Rosalind Achterberg",
      email: "ros.achterberg@example.test",
      weight: lb(143),
      gearIncluded: false,
      skill: "advanced",
      style: "smooth",
    },
    { discipline: "enduro", terrain: ["rocky", "roots"], jumpSize: "small", hoursPerMonth: 20 },
    { complaints: ["harsh-small-bumps", "kicks"], notes: "Deflects off roots and rocks." },
  ),
  request(
    "r03",
    "submitted",
    1,
    "mx-250-4t",
    {
      name: "Kwame Oyelaran",
      email: "kwame.oyelaran@example.test",
      weight: kg(68),
      gearIncluded: false,
      skill: "novice",
      style: "moderate",
    },
    { discipline: "motocross", terrain: ["sand"], jumpSize: "medium", hoursPerMonth: 8 },
    { complaints: ["rides-high"] },
  ),
  request(
    "r04",
    "in_review",
    2,
    "mx-450-4t",
    {
      name: "Priya Castellane",
      email: "priya.castellane@example.test",
      weight: kg(74),
      gearIncluded: true,
      skill: "expert",
      style: "aggressive",
    },
    { discipline: "supercross", terrain: ["hardpack"], jumpSize: "large", hoursPerMonth: 30 },
    { complaints: ["headshake"], currentSag: { unit: "mm", rearRace: 98, rearStatic: 30 } },
    { tuner: "tuner@sagwise.test" },
  ),
  request(
    "r05",
    "in_review",
    3,
    "youth-85",
    {
      name: "Milo Fennimore",
      email: "fennimore.family@example.test",
      weight: kg(41),
      gearIncluded: false,
      skill: "beginner",
      style: "smooth",
    },
    { discipline: "motocross", terrain: ["loam"], jumpSize: "small", hoursPerMonth: 6 },
    { complaints: ["rides-high", "harsh-small-bumps"], notes: "Youth rider, growing fast." },
    { tuner: "tuner2@sagwise.test" },
  ),
  request(
    "r06",
    "in_review",
    4,
    "enduro-300-2t",
    {
      name: "Gudrun Vasquez-Holm",
      email: "gudrun.vh@example.test",
      weight: lb(205),
      gearIncluded: false,
      skill: "intermediate",
      style: "moderate",
    },
    { discipline: "cross-country", terrain: ["roots", "mud"], jumpSize: "small", hoursPerMonth: 15 },
    { complaints: ["wallows", "rides-low"] },
    { tuner: "tuner@sagwise.test" },
  ),
  request(
    "r07",
    "waiting_for_rider",
    5,
    "mx-250-4t",
    {
      name: "Anselm Okonkwo-Reyes",
      email: "anselm.or@example.test",
      weight: kg(79),
      gearIncluded: false,
      skill: "advanced",
      style: "aggressive",
    },
    { discipline: "motocross", terrain: ["sand", "loam"], jumpSize: "large", hoursPerMonth: 16 },
    { complaints: ["bottoming"] },
    { tuner: "tuner2@sagwise.test", question: "Is the shock linkage original, or has a lowering link been fitted?" },
  ),
  request(
    "r08",
    "waiting_for_rider",
    6,
    "mx-450-4t",
    {
      name: "Lotte Brightwater",
      email: "lotte.brightwater@example.test",
      weight: kg(63),
      gearIncluded: false,
      skill: "intermediate",
      style: "smooth",
    },
    { discipline: "trail", terrain: ["rocky", "hardpack"], jumpSize: "none", hoursPerMonth: 10 },
    { complaints: ["harsh-small-bumps"] },
    { tuner: "tuner@sagwise.test", question: "Roughly how much of your riding is seated on tight trails?" },
  ),
  request(
    "r09",
    "approved",
    9,
    "mx-450-4t",
    {
      name: "Dario Lindqvist",
      email: "dario.lindqvist@example.test",
      weight: kg(86),
      gearIncluded: false,
      skill: "advanced",
      style: "moderate",
    },
    { discipline: "motocross", terrain: ["loam", "hardpack"], jumpSize: "large", hoursPerMonth: 18 },
    { complaints: ["bottoming"] },
    { tuner: "tuner@sagwise.test" },
  ),
  request(
    "r10",
    "approved",
    12,
    "enduro-300-2t",
    {
      name: "Hana Whitlock",
      email: "hana.whitlock@example.test",
      weight: lb(128),
      gearIncluded: false,
      skill: "intermediate",
      style: "smooth",
    },
    { discipline: "enduro", terrain: ["rocky", "roots", "mud"], jumpSize: "small", hoursPerMonth: 14 },
    { complaints: ["harsh-small-bumps"] },
    { tuner: "tuner2@sagwise.test" },
  ),
  request(
    "r11",
    "approved",
    15,
    "mx-250-4t",
    {
      name: "Callum Ferreira-Stone",
      email: "callum.fs@example.test",
      weight: kg(71),
      gearIncluded: false,
      skill: "pro",
      style: "aggressive",
    },
    { discipline: "supercross", terrain: ["hardpack"], jumpSize: "large", hoursPerMonth: 40 },
    { complaints: ["dives-braking"] },
    { tuner: "tuner@sagwise.test" },
  ),
  request(
    "r12",
    "declined",
    20,
    "mx-450-4t",
    {
      name: "Odile Marchetti",
      email: "odile.marchetti@example.test",
      weight: kg(77),
      gearIncluded: false,
      skill: "intermediate",
      style: "moderate",
    },
    { discipline: "desert", terrain: ["sand", "rocky"], jumpSize: "medium", hoursPerMonth: 12 },
    { complaints: ["wallows"] },
    {
      tuner: "tuner2@sagwise.test",
      declineReason: "The fork has been converted to a cartridge we do not service; we can size the shock only.",
    },
  ),
  // Sag reports on one model, for the calibration page: riders of many weights on the 125 class.
  ...[
    ["c01", 75, "Wren Halloway", "wren.halloway@example.test", 56, "novice"],
    ["c02", 68, "Baptiste Oduya", "baptiste.oduya@example.test", 64, "intermediate"],
    ["c03", 61, "Sunniva Kettleby", "sunniva.kettleby@example.test", 71, "advanced"],
    ["c04", 54, "Idris Marlowe-Penn", "idris.mp@example.test", 79, "intermediate"],
    ["c05", 47, "Noor Castellanos", "noor.castellanos@example.test", 87, "expert"],
    ["c06", 40, "Emrys Tolliver", "emrys.tolliver@example.test", 96, "intermediate"],
  ].map(([key, daysAgo, name, email, massKg, skill]) =>
    request(
      key as string,
      "approved",
      daysAgo as number,
      "mx-125-2t",
      {
        name: name as string,
        email: email as string,
        weight: kg(massKg as number),
        gearIncluded: false,
        skill: skill as Rider["skill"],
        style: "moderate",
      },
      { discipline: "motocross", terrain: ["loam"], jumpSize: "medium", hoursPerMonth: 10 },
      { complaints: [] },
      { tuner: "tuner@sagwise.test", sagReportDaysAfter: 6 },
    ),
  ),
];

/**
 * The demo's 125 class is really this much heavier than its catalog entry (sprung mass per end,
 * bike alone): the seeded sag readings are what riders would measure on such a bike, so the
 * calibration page has something to fit. Invented.
 */
export const DEMO_CALIBRATION_TRUTH = { bikeClass: "mx-125-2t", extraRearSprungKg: 3, extraFrontSprungKg: 2 } as const;
