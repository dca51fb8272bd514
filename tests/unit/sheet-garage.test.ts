// What a rider needs in the garage, read back from the rendered sheet as a person would: pdftotext
// for the words, and the QR code decoded from the page image (pdftoppm → pngjs → jsQR, an ISO/IEC
// 18004 decoder independent of the `qrcode` encoder) back to the private report link.
import jsQR from "jsqr";
import { describe, expect, it } from "vitest";
import { renderSetupSheet } from "@/lib/pdf";
import { demoSheetData, demoSizingInput } from "@/lib/pdf/demo-data";
import { legendLines } from "@/lib/pdf/sections/chart";
import { clickerReason } from "@/lib/pdf/sections/clickers";
import { recommend, sizingDefaults, type ClickerSetting } from "@/lib/sizing";
import { pdfInfo, pdfPagePixels, pdfText, squash } from "../helpers/pdf";

const lastPage = (pdf: Uint8Array) => Number(pdfInfo(pdf).Pages);

function decodeQr(pdf: Uint8Array): string | null {
  const { data, width, height } = pdfPagePixels(pdf, lastPage(pdf));
  return jsQR(data, width, height)?.data ?? null;
}

describe("the approved sheet", () => {
  it("carries a QR code that decodes to the printed private report link", async () => {
    const data = demoSheetData();
    const pdf = await renderSetupSheet(data);
    const text = squash(pdfText(pdf));
    expect(text).toContain(data.reportUrl!);
    expect(text).toContain("Scan the code with your phone's camera");
    expect(decodeQr(pdf)).toBe(data.reportUrl);
  });

  it("has boxes for the three readings and the two sags, per end, in the sheet's words", async () => {
    const text = squash(pdfText(await renderSetupSheet(demoSheetData())));
    expect(text).toContain("Your readings (mm)");
    for (const label of [
      "A: fully extended",
      "B: on its own weight",
      "C: you aboard",
      "Static sag A − B",
      "Race sag A − C",
    ])
      expect(text).toContain(label);
    expect(text).toMatch(/Rear \(shock\)/);
  });

  it("says which sizing basis the figures come from", async () => {
    const data = demoSheetData();
    const rec = data.recommendation;
    const text = squash(pdfText(await renderSetupSheet(data))).replace(/\s+/g, " ");
    expect(text).toContain("Where these figures come from:");
    expect(text).toMatch(/sized on (ride frequency|sag window)/);
    expect(text).toContain("Bike loads from the shop's catalog.");
    expect(text).toContain(`Sizing engine ${rec.engineVersion}.`);
  });

  it("shows the springs fitted now beside stock only where they differ", async () => {
    const bike = sizingDefaults.GENERIC_BIKE_CLASSES.find((c) => c.id === "mx-450-4t")!.spec;
    const stockFork = bike.fork.stockRateNmm!;
    const stockShock = bike.rear.stockRateNmm;
    const data = demoSheetData();
    // The rider says the fork has a spring 10 % stiffer than stock and the shock its stock spring.
    data.recommendation = recommend({
      ...demoSizingInput(),
      currentSprings: { forkRateNmm: stockFork * 1.1, shockRateNmm: stockShock },
    });
    // Column headings wrap in their narrow columns: read the words with the line breaks folded.
    const text = pdfText(await renderSetupSheet(data));
    const words = text.replace(/\s+/g, " ");
    expect(words).toMatch(/Fitted now \(as/);
    expect(text).toContain(`${(stockFork * 1.1).toFixed(2)} N/mm`);
    expect(words).toMatch(/Stock, fitted now \(as you/);
    // Stock shown once for the shock (it is what is fitted), twice for the fork (stock and fitted).
    expect(words.match(/Fitted now \(as/g)).toHaveLength(1);
  });

  it("prints the fork oil type and volume per leg where the catalog has them, and nothing where not", async () => {
    const data = demoSheetData();
    expect(pdfText(await renderSetupSheet(data))).not.toContain("Fork oil");
    data.request.forkOil = { type: "5W fork oil", volumeMlPerLeg: 385.5 };
    expect(squash(pdfText(await renderSetupSheet(data)))).toContain("Fork oil 5W fork oil, 385.5 ml in each leg");
  });

  it("a draft preview prints no link and no QR code", async () => {
    const pdf = await renderSetupSheet(demoSheetData({ draft: true }));
    expect(pdfText(pdf)).not.toMatch(/\/status\//);
    expect(decodeQr(pdf)).toBeNull();
  });
});

describe("clicker rows give one coherent reason", () => {
  const base: ClickerSetting = {
    id: "forkCompression",
    unit: "clicks",
    min: 0,
    max: 20,
    stock: 12,
    position: 12,
    moves: [],
  };
  const bottoming = { change: -2, reason: "Bottoming: firm fork compression 2 clicks" };
  const harsh = { change: 2, reason: "Harsh on small bumps: soften fork compression 2 clicks" };
  const dives = { change: -2, reason: "Dives under braking: firm fork compression 2 clicks" };

  it("opposite moves that cancel leave stock and say so, with no opposite advice", () => {
    expect(clickerReason({ ...base, moves: [bottoming, harsh] })).toBe(
      "Stock: the changes for bottoming and harsh on small bumps cancel out",
    );
  });
  it("the net direction and only the causes that push that way; the outweighed one is named", () => {
    expect(clickerReason({ ...base, position: 10, moves: [bottoming, dives, harsh] })).toBe(
      "2 clicks firmer than stock, for bottoming and dives under braking (outweighs harsh on small bumps)",
    );
  });
  it("rebound out is faster, in is slower (counted out from fully closed: common practice)", () => {
    expect(
      clickerReason({
        ...base,
        id: "shockRebound",
        position: 10,
        moves: [{ change: -2, reason: "Rear kicks: slow shock rebound 2 clicks" }],
      }),
    ).toBe("2 clicks slower than stock, for rear kicks");
  });
  it("a tuner's setting is its own reason", () => {
    expect(
      clickerReason({ ...base, position: 9, moves: [bottoming, { change: -1, reason: "Set by the tuner" }] }),
    ).toBe("3 clicks firmer than stock, set by the tuner");
  });
  it("no move, no reason", () => {
    expect(clickerReason(base)).toBe("–");
  });
});

describe("chart legend", () => {
  it("lists the dashed neighbours once, in one entry", () => {
    const series = [
      { id: "fork", label: "Oil level 110 mm", emphasis: "main" as const, d: "" },
      { id: "oil-105", label: "Oil level 105 mm", emphasis: "secondary" as const, d: "" },
      { id: "oil-115", label: "Oil level 115 mm", emphasis: "secondary" as const, d: "" },
      { id: "oil-115b", label: "Oil level 115 mm", emphasis: "secondary" as const, d: "" },
    ];
    expect(legendLines(series)).toEqual([
      "Solid line: Oil level 110 mm",
      "Dashed lines: Oil level 105 mm; Oil level 115 mm",
    ]);
  });
});
