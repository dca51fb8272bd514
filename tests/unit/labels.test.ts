// One vocabulary (lib/labels.ts): every code the engine and the database use has the shop's words,
// the spellings of a discipline meet in one label, and no e-mail template or setup sheet shows a raw
// code or one of zod's default messages. The pages are walked the same way by the browser test
// (tests/e2e/staff-pages.spec.ts).
import { describe, expect, it } from "vitest";
import { emailTemplateNames, emailTemplates } from "@/emails";
import type { StaffNoticeEmailKind } from "@/emails/staff-notice";
import {
  ALL_LABEL_TABLES,
  BIKE_CLASS_LABELS,
  CLICKER_LABELS,
  COMPLAINT_LABELS,
  DISCIPLINE_LABELS,
  EMAIL_TEMPLATE_LABELS,
  STAFF_NOTICE_LABELS,
  disciplineLabel,
  humanize,
  overrideFieldLabel,
} from "@/lib/labels";
import { renderTemplate } from "@/lib/mail";
import { renderSetupSheet } from "@/lib/pdf";
import { demoSheetData } from "@/lib/pdf/demo-data";
import { REQUEST_STATUSES } from "@/lib/requests/status";
import {
  CLICKER_IDS,
  COMPLAINTS,
  DISCIPLINES,
  FORK_KINDS,
  JUMP_SIZES,
  RATE_BASES,
  RIDING_STYLES,
  SKILL_LEVELS,
  TERRAINS,
} from "@/lib/sizing";
import { GENERIC_BIKE_CLASSES } from "@/lib/sizing/bike-classes";
import { STAFF_NOTICE_KINDS } from "@/db/tables/notices";
import { pdfText } from "../helpers/pdf";
import { unspokenWords } from "../helpers/vocabulary";

function assertWords(text: string, where: string) {
  expect(unspokenWords(text), where).toEqual([]);
}

describe("the vocabulary", () => {
  it("has words for every code the engine and the database use", () => {
    const tables: [readonly string[], Record<string, string>][] = [
      [SKILL_LEVELS, ALL_LABEL_TABLES.SKILL_LABELS],
      [RIDING_STYLES, ALL_LABEL_TABLES.STYLE_LABELS],
      [DISCIPLINES, DISCIPLINE_LABELS],
      [TERRAINS, ALL_LABEL_TABLES.TERRAIN_LABELS],
      [JUMP_SIZES, ALL_LABEL_TABLES.JUMP_LABELS],
      [COMPLAINTS, COMPLAINT_LABELS],
      [CLICKER_IDS, CLICKER_LABELS],
      [FORK_KINDS, ALL_LABEL_TABLES.FORK_KIND_LABELS],
      [RATE_BASES, ALL_LABEL_TABLES.RATE_BASIS_LABELS],
      [REQUEST_STATUSES, ALL_LABEL_TABLES.STATUS_LABELS],
      [GENERIC_BIKE_CLASSES.map((c) => c.id), BIKE_CLASS_LABELS],
      [STAFF_NOTICE_KINDS, STAFF_NOTICE_LABELS],
      [emailTemplateNames, EMAIL_TEMPLATE_LABELS],
    ];
    for (const [codes, labels] of tables)
      for (const code of codes) {
        expect(labels[code], code).toBeTruthy();
        expect(labels[code], code).not.toBe(code);
      }
  });

  it("reads every spelling of cross-country as one", () => {
    for (const spelling of ["cross-country", "Cross Country", "cross_country", "XC", "crosscountry", " Cross-Country "])
      expect(disciplineLabel(spelling)).toBe("Cross-country");
    expect(disciplineLabel("supercross")).toBe("Supercross");
  });

  it("names the tuner's figures in words, and makes an unknown code readable", () => {
    expect(overrideFieldLabel("rear.rateNmm")).toBe("Shock spring rate (N/mm)");
    expect(overrideFieldLabel("front.oilLevelMm")).toBe("Fork oil level (mm)");
    expect(overrideFieldLabel("clickers.shockLowSpeedCompression")).toBe("Shock low-speed compression (clicks)");
    expect(humanize("harsh-small-bumps")).toBe("Harsh small bumps");
    expect(humanize("shockLowSpeedCompression")).toBe("Shock low speed compression");
  });
});

describe("e-mails and the sheet show words, never codes", () => {
  it.each(emailTemplateNames)("template %s", async (name) => {
    const { subject, text } = await renderTemplate(name, emailTemplates[name].demoProps as never);
    assertWords(`${subject}\n${text}`, name);
  });

  it.each(["new-request", "rider-answered", "sag-reported", "payment-received"] as StaffNoticeEmailKind[])(
    "the notice to the shop about %s",
    async (kind) => {
      const { subject, text } = await renderTemplate("staff-notice", {
        ...emailTemplates["staff-notice"].demoProps,
        kind,
        tunerName: null,
      });
      assertWords(`${subject}\n${text}`, kind);
      expect(text).toContain("not assigned to a tuner yet");
    },
  );

  it("the setup sheet names discipline and skill in words", async () => {
    const data = demoSheetData();
    data.request.discipline = "cross-country";
    data.request.skill = "intermediate";
    const text = pdfText(await renderSetupSheet(data));
    expect(text).toContain("Cross-country, intermediate");
    assertWords(text, "sheet");
  }, 60_000);
});
