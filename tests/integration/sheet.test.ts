// The setup sheet PDF of a seeded approved request, read back with pdftotext/pdfinfo (poppler-utils):
// every figure of the recommendation with its unit, conversions checked against NIST SP 811 factors
// (through mathjs as an independent unit library, and our convertRate), the cautions, page count and
// paper size, reproducibility, and the route's access rules.
import { eq } from "drizzle-orm";
import { unit } from "mathjs";
import { setupServer } from "msw/node";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/requests/[id]/sheet/route";
import { getDb } from "@/db/client";
import { findSheetVersion } from "@/db/queries/sheet";
import { findRequestIdByStatusToken } from "@/db/queries/status-links";
import { setupRequests, shopSettings } from "@/db/schema";
import { seedDemo, stableUuid } from "@/db/seed-demo";
import { appBaseUrl } from "@/lib/env";
import { renderSetupSheet } from "@/lib/pdf";
import { demoSheetData } from "@/lib/pdf/demo-data";
import { demoStatusToken } from "@/lib/requests/token";
import { convertRate, recommendationSchema, type Recommendation } from "@/lib/sizing";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";
import { captureMail, cookieFrom, signInStaff, signInWithEmailLink } from "../helpers/auth";
import { pdfFonts, pdfInfo, pdfText, squash } from "../helpers/pdf";

const SECRET = process.env.BETTER_AUTH_SECRET!; // the seed derives demo links from it
const r09 = stableUuid("request:r09");
const r10 = stableUuid("request:r10");
const r04 = stableUuid("request:r04"); // in review: version 1 is a draft
const server = setupServer();
let staffCookie = "";
let sent: ReturnType<typeof captureMail>;

async function getSheet(id: string, query: Record<string, string>, cookie?: string) {
  const url = `${appBaseUrl()}/api/requests/${id}/sheet?${new URLSearchParams(query)}`;
  return GET(new Request(url, { headers: cookie ? { cookie } : {} }), { params: Promise.resolve({ id }) });
}

async function pdfOf(response: Response): Promise<Uint8Array> {
  expect(response.status).toBe(200);
  expect(response.headers.get("content-type")).toBe("application/pdf");
  return new Uint8Array(await response.arrayBuffer());
}

async function storedRecommendation(id: string): Promise<Recommendation> {
  return recommendationSchema.parse((await findSheetVersion(id, 1))!.output);
}

beforeAll(async () => {
  await createTestDatabase();
  await seedDemo();
  // react-pdf's layout engine loads its WebAssembly through fetch on first use: load it before msw
  // takes over fetch.
  await renderSetupSheet(demoSheetData());
  server.listen({ onUnhandledRequest: "error" });
  sent = captureMail(server);
  staffCookie = cookieFrom(await signInStaff("tuner@sagwise.test", "sagwise-demo"));
}, 120_000);
afterAll(async () => {
  server.close();
  await closeTestDatabase();
});

// NIST SP 811 (2008) Appendix B: 1 kgf = 9.80665 N, 1 lbf = 4.4482216152605 N, 1 in = 25.4 mm, all
// exact. mathjs defines its units from the same definitions, independently of lib/sizing.
const kgfMm = (nMm: number) => unit(nMm, "N/mm").toNumber("kgf/mm");
const lbfIn = (nMm: number) => unit(nMm, "N/mm").toNumber("lbf/in");

describe("setup sheet of seeded approved request r09", () => {
  let text = "";
  let flat = "";
  let rec: Recommendation;
  let pdf: Uint8Array;

  beforeAll(async () => {
    pdf = await pdfOf(await getSheet(r09, { version: "1" }, staffCookie));
    text = pdfText(pdf);
    flat = squash(text);
    rec = await storedRecommendation(r09);
  });

  it("is a sane PDF: A4 from the shop settings, two pages, fixed metadata", () => {
    const info = pdfInfo(pdf);
    expect(Number(info.Pages)).toBeGreaterThanOrEqual(1);
    expect(Number(info.Pages)).toBeLessThanOrEqual(3);
    // ISO 216: A4 is 210 × 297 mm = 595.28 × 841.89 pt.
    expect(info["Page size"]).toContain("595.28 x 841.89");
    expect(info.Title).toBe("Setup sheet, request 9, version 1");
    // Only the shipped Inter, embedded as subsets: no text left to a viewer's fallback font.
    const fonts = pdfFonts(pdf);
    expect(fonts.map((f) => f.name.replace(/^[A-Z]{6}\+/, "")).sort()).toEqual([
      "Inter-Bold",
      "Inter-Regular",
      "Inter-SemiBold",
    ]);
    expect(fonts.every((f) => f.embedded)).toBe(true);
  });

  it("shows the shop, the rider, the bike, the version, the approval date and the tuner", () => {
    expect(flat).toContain("Cinderline Suspension (demo)");
    expect(flat).toContain("workshop@cinderline.test");
    expect(flat).toContain("Dario Lindqvist");
    expect(flat).toContain("450 four-stroke motocross");
    expect(flat).toMatch(/Version 1 · approved \d{1,2} [A-Z][a-z]+ \d{4} by Teo Brambleton/);
    expect(flat).not.toMatch(/DRAFT|draft/);
  });

  it("gives each spring rate in N/mm, kgf/mm and lbf/in next to the stock rate (NIST SP 811 factors)", () => {
    const fork = [rec.front.chosenRate!.nMm, rec.front.stockRate!.nMm];
    for (const n of fork) {
      expect(flat).toContain(`${n.toFixed(2)} N/mm`);
      expect(flat).toContain(`${kgfMm(n).toFixed(3)} kgf/mm`);
      expect(flat).toContain(`${lbfIn(n).toFixed(1)} lbf/in`);
    }
    for (const n of [rec.rear.chosenRate.nMm, rec.rear.stockRate.nMm]) {
      expect(flat).toContain(`${n.toFixed(1)} N/mm`);
      expect(flat).toContain(`${kgfMm(n).toFixed(2)} kgf/mm`);
      expect(flat).toContain(`${lbfIn(n).toFixed(0)} lbf/in`);
    }
  });

  it("printed conversions agree with convertRate to the printed precision", () => {
    // The rate tables read back from the page: a line of kgf/mm figures sits between its N/mm and
    // lbf/in lines, fork (recommended, stock) then shock (recommended, stock) from left to right.
    const lines = text.split("\n").filter((l) => l.trim());
    const figures = (line: string, u: string) =>
      [...line.matchAll(new RegExp(`([\\d.]+) ${u}`, "g"))].map((m) => m[1]!);
    const rows = lines.flatMap((line, i) => {
      const kgf = figures(line, "kgf/mm");
      if (kgf.length < 2) return [];
      const n = figures(lines[i - 1]!, "N/mm");
      const lbf = figures(lines[i + 1]!, "lbf/in");
      return kgf.map((k, j) => ({ n: n[j]!, kgf: k, lbf: lbf[j]! }));
    });
    expect(rows).toHaveLength(4);
    const halfUlp = (s: string) => 0.5 * 10 ** -(s.split(".")[1]?.length ?? 0);
    for (const { n, kgf, lbf } of rows) {
      // The N/mm figure is itself rounded: allow its rounding, carried through the factor.
      const nTol = halfUlp(n);
      expect(Math.abs(convertRate(Number(n), "N/mm", "kgf/mm") - Number(kgf))).toBeLessThanOrEqual(
        halfUlp(kgf) + convertRate(nTol, "N/mm", "kgf/mm") + 1e-9,
      );
      expect(Math.abs(convertRate(Number(n), "N/mm", "lbf/in") - Number(lbf))).toBeLessThanOrEqual(
        halfUlp(lbf) + convertRate(nTol, "N/mm", "lbf/in") + 1e-9,
      );
    }
  });

  it("gives preload in mm and collar turns, sag targets, expected sag and the oil level", () => {
    expect(flat).toContain(`Preload ${rec.rear.preloadMm.toFixed(1)} mm`);
    expect(flat).toContain(`Preload ${rec.front.preloadMm!.toFixed(1)} mm`);
    // Screw thread: turns = preload / pitch.
    const turns = rec.rear.preloadMm / rec.input.bike.rear.collarPitchMm;
    expect(flat).toContain(`${turns.toFixed(1)} turns from where the collar`);
    for (const end of [rec.front, rec.rear]) {
      expect(flat).toContain(`Race sag target ${end.sagTargets.raceSagMm.toFixed(0)} mm`);
      expect(flat).toContain(
        `Static sag window ${end.sagTargets.staticSagMinMm.toFixed(0)}–${end.sagTargets.staticSagMaxMm.toFixed(0)} mm`,
      );
      expect(flat).toContain(
        `race ${end.predicted.raceSagMm.toFixed(0)} mm, static ${end.predicted.staticSagMm.toFixed(0)} mm`,
      );
    }
    expect(flat).toContain(
      `Oil level ${rec.front.oilLevelMm!.toFixed(0)} mm (stock ${rec.front.stockOilLevelMm.toFixed(0)} mm)`,
    );
  });

  it("lists every starting clicker position counted out from fully closed, beside stock", () => {
    expect(flat).toContain("count out");
    expect(flat).toContain("fully closed");
    // The shop's one vocabulary (lib/labels.ts), the same words as on screen.
    const names = {
      forkCompression: "Fork compression",
      forkRebound: "Fork rebound",
      shockLowSpeedCompression: "Shock low-speed compression",
      shockHighSpeedCompression: "Shock high-speed compression",
      shockRebound: "Shock rebound",
    } as const;
    for (const c of rec.clickers) {
      const count = (v: number) =>
        c.unit === "clicks" ? `${v} click${v === 1 ? "" : "s"}` : `${String(v)} turn${v === 1 ? "" : "s"}`;
      expect(flat).toContain(`${names[c.id]} ${count(c.position)} ${count(c.stock)}`);
    }
  });

  it("explains free, static and race sag step by step and carries the cautions", () => {
    // One set of words and reading labels on the sheet, the status page and the e-mails
    // (lib/validations/sag-terms.ts); the method is common practice.
    expect(flat).toContain("Reading A, fully extended: Bike on a stand, wheel hanging free.");
    expect(flat).toContain("Reading B, on its own weight");
    expect(flat).toContain("Reading C, you aboard");
    expect(flat).toContain("Free sag (optional)");
    expect(flat).not.toMatch(/L[123]\b/);
    expect(flat).toContain("Static sag = A − B");
    expect(flat).toContain("Race sag = A − C");
    expect(flat).toContain("Springs and gas-charged shocks store energy");
    expect(flat).toContain("manufacturer's service manual");
    expect(flat).toContain("qualified technician");
    expect(flat).toMatch(/re-check sag, the tightening torque of every fastener/);
  });

  it("prints the tuner's notes and a private report link that opens this request", async () => {
    expect(flat).toContain("Set race sag first, then check static sag");
    const token = /\/status\/([A-Za-z0-9_-]{40,})/.exec(text)?.[1];
    expect(token).toBeTruthy();
    expect(await findRequestIdByStatusToken(token!)).toBe(r09);
    // Printed as a working link on an approved sheet (a PDF link annotation, ISO 32000-1 §12.6.4.7).
    expect(Buffer.from(pdf).toString("latin1")).toMatch(/\/URI\s*\(/);
  });

  it("is reproducible: the same version renders to the same text and bytes", async () => {
    const again = await pdfOf(await getSheet(r09, { version: "1", token: demoStatusToken(SECRET, r09) }));
    expect(pdfText(again)).toBe(text);
    expect(Buffer.from(again).equals(Buffer.from(pdf))).toBe(true);
  });

  it("offers a file name with the request number and version", async () => {
    const response = await getSheet(r09, { version: "1" }, staffCookie);
    expect(response.headers.get("content-disposition")).toBe('inline; filename="setup-sheet-9-v1.pdf"');
    expect(response.headers.get("cache-control")).toBe("private, no-store");
  });
});

describe("every seeded approved request downloads at once", () => {
  it.each(["r09", "r10", "r11"])("%s", async (key) => {
    const id = stableUuid(`request:${key}`);
    const pdf = await pdfOf(await getSheet(id, { version: "1", token: demoStatusToken(SECRET, id) }));
    const rec = await storedRecommendation(id);
    const flat = squash(pdfText(pdf));
    expect(flat).toContain(`${rec.rear.chosenRate.nMm.toFixed(1)} N/mm`);
    expect(flat).toContain("store energy");
  });
});

describe("paper size", () => {
  it("is US Letter when the shop chooses it", async () => {
    const db = await getDb();
    await db.update(shopSettings).set({ paperSize: "LETTER" }).where(eq(shopSettings.id, 1));
    try {
      const pdf = await pdfOf(await getSheet(r09, { version: "1" }, staffCookie));
      // ANSI/ASME Y14.1: US Letter is 8.5 × 11 in = 612 × 792 pt.
      expect(pdfInfo(pdf)["Page size"]).toContain("612 x 792");
      expect(Number(pdfInfo(pdf).Pages)).toBeLessThanOrEqual(3);
    } finally {
      await db.update(shopSettings).set({ paperSize: "A4" }).where(eq(shopSettings.id, 1));
    }
  });
});

describe("who may open a sheet", () => {
  it("refuses an anonymous visitor with 401", async () => {
    const response = await getSheet(r09, { version: "1" });
    expect(response.status).toBe(401);
  });

  it("refuses another request's token with 403 and shows nothing of either", async () => {
    const response = await getSheet(r09, { version: "1", token: demoStatusToken(SECRET, r10) });
    expect(response.status).toBe(403);
    expect(response.headers.get("content-type")).toContain("application/json");
    const body = await response.text();
    expect(body).not.toMatch(/Lindqvist|Whitlock|N\/mm/);
  });

  it("refuses a made-up token with 403", async () => {
    const response = await getSheet(r09, { version: "1", token: "x".repeat(43) });
    expect(response.status).toBe(403);
  });

  it("refuses the rider a draft version (403); staff get it only as a watermarked preview", async () => {
    const token = demoStatusToken(SECRET, r04);
    expect((await getSheet(r04, { version: "1", token })).status).toBe(403);
    expect((await getSheet(r04, { version: "1", token, preview: "1" })).status).toBe(403);
    const plain = await getSheet(r04, { version: "1" }, staffCookie);
    expect(plain.status).toBe(409);
    expect(((await plain.json()) as { fields: Record<string, string> }).fields).toHaveProperty("preview");
    const preview = await getSheet(r04, { version: "1", preview: "1" }, staffCookie);
    expect(preview.headers.get("content-disposition")).toContain("-v1-draft.pdf");
    const text = pdfText(await pdfOf(preview));
    expect(text).toContain("DRAFT PREVIEW: not approved, do not set up the bike from this sheet");
    expect(text).toContain("draft, not approved yet");
    // A draft carries no live link: the sentence says it comes with approval, and no link is printed.
    expect(text.replace(/\s+/g, " ")).toContain("the rider's private link appears here once the sheet is approved");
    expect(text).not.toMatch(/\/status\//);
    expect(
      Buffer.from(await pdfOf(await getSheet(r04, { version: "1", preview: "1" }, staffCookie))).toString("latin1"),
    ).not.toMatch(/\/URI\s*\(/);
  });

  it("answers 404 for an unknown version or request, 400 naming the field for a bad version", async () => {
    expect((await getSheet(r09, { version: "7" }, staffCookie)).status).toBe(404);
    expect((await getSheet(stableUuid("request:nope"), { version: "1" }, staffCookie)).status).toBe(404);
    expect((await getSheet("not-a-uuid", { version: "1" }, staffCookie)).status).toBe(404);
    for (const version of ["0", "1.5", "abc"]) {
      const bad = await getSheet(r09, { version }, staffCookie);
      expect(bad.status).toBe(400);
      expect(((await bad.json()) as { fields: Record<string, string> }).fields).toHaveProperty("version");
    }
    const missing = await getSheet(r09, {}, staffCookie);
    expect(((await missing.json()) as { fields: Record<string, string> }).fields.version).toBe(
      "Give the version number",
    );
  });

  it("lets the rider in by their own e-mail sign-in, and no other rider", async () => {
    const db = await getDb();
    const [row] = await db
      .select({ email: setupRequests.riderEmail })
      .from(setupRequests)
      .where(eq(setupRequests.id, r09));
    const own = await signInWithEmailLink(row!.email, sent);
    expect((await getSheet(r09, { version: "1" }, own.cookie)).status).toBe(200);
    const other = await signInWithEmailLink("someone.else@example.test", sent);
    const refused = await getSheet(r09, { version: "1" }, other.cookie);
    expect(refused.status).toBe(403);
    expect(await refused.text()).not.toContain("Lindqvist");
  });
});

describe("an air fork, imperial shop, US Letter (invented data, generic class)", () => {
  it("gives the gauge pressure in kPa, bar and psi, and lengths in inches beside mm", async () => {
    const data = demoSheetData({ airFork: true, imperial: true, paperSize: "LETTER" });
    const pdf = await renderSetupSheet(data);
    const flat = squash(pdfText(pdf));
    const p = data.recommendation.front.airPressure!;
    expect(data.recommendation.front.chosenRate).toBeNull();
    // 1 bar = 100 kPa (SI Brochure, 9th ed., Table 8); 1 psi = 1 lbf/in² (NIST SP 811 B.8), via mathjs.
    expect(flat).toContain(`${p.kpaGauge.toFixed(0)} kPa`);
    expect(flat).toContain(`${unit(p.kpaGauge, "kPa").toNumber("bar").toFixed(2)} bar`);
    expect(flat).toContain(`${unit(p.kpaGauge, "kPa").toNumber("lbf/inch^2").toFixed(1)} psi`);
    // 1 in = 25.4 mm exactly (NIST SP 811 B.8).
    const race = data.recommendation.rear.sagTargets.raceSagMm;
    expect(flat).toContain(
      `Race sag target ${race.toFixed(0)} mm (${unit(race, "mm").toNumber("inch").toFixed(2)} in)`,
    );
    expect(flat).not.toContain("Oil level: measured down");
    expect(pdfInfo(pdf)["Page size"]).toContain("612 x 792");
  });
});
