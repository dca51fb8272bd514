// The setup sheet's shaping cache (lib/pdf/shaping-cache.ts) is a speed-up only: a sheet rendered
// with it must be byte for byte the sheet react-pdf renders without it (the reference is react-pdf
// and fontkit themselves, called directly), and the cache must tell apart what changes a shaped run
// (text, OpenType features, script, language, direction; fontkit's layout signature).
import { Font, renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { describe, expect, it } from "vitest";
import { renderSetupSheet } from "@/lib/pdf";
import { demoSheetData } from "@/lib/pdf/demo-data";
import { SHEET_FONT, registerSheetFonts } from "@/lib/pdf/fonts";
import { SetupSheet } from "@/lib/pdf/setup-sheet";
import { SHAPING_CACHE_CHARS, SHAPING_CACHE_MAX_RUN, cacheShaping } from "@/lib/pdf/shaping-cache";

function fakeFont() {
  const calls: unknown[][] = [];
  const font = {
    layout: (...args: unknown[]) => {
      calls.push(args);
      return { shaped: args[0], call: calls.length };
    },
  };
  return { font, calls };
}

describe("shaping cache on a font", () => {
  it("shapes a run once and hands the same result back", () => {
    const { font, calls } = fakeFont();
    cacheShaping(font);
    const first = font.layout("Race sag target", [], undefined, undefined, "ltr");
    expect(font.layout("Race sag target", [], undefined, undefined, "ltr")).toBe(first);
    expect(calls).toHaveLength(1);
  });

  it("keys on features, script, language and direction as well as the text", () => {
    const { font, calls } = fakeFont();
    cacheShaping(font);
    font.layout("12:30", [], undefined, undefined, "ltr");
    font.layout("12:30", undefined, undefined, undefined, "ltr"); // no features = the defaults, as []
    font.layout("12:30", ["tnum"], undefined, undefined, "ltr");
    font.layout("12:30", { calt: false }, undefined, undefined, "ltr");
    font.layout("12:30", [], "latn", undefined, "ltr");
    font.layout("12:30", [], undefined, "DEU", "ltr");
    font.layout("12:30", [], undefined, undefined, "rtl");
    expect(calls).toHaveLength(6);
  });

  it("is installed once per font, however often a render asks", () => {
    const { font, calls } = fakeFont();
    const cache = cacheShaping(font);
    expect(cacheShaping(font)).toBe(cache);
    font.layout("mm");
    font.layout("mm");
    expect(calls).toHaveLength(1);
  });

  it("drops the least recently used runs once full", () => {
    const { font, calls } = fakeFont();
    const cache = cacheShaping(font);
    // Each key is the text and four separators: 100 runs of 496 characters fill it exactly.
    const run = (i: number) => `${String(i).padStart(3, "0")} `.padEnd(496, "x");
    const fit = SHAPING_CACHE_CHARS / 500;
    for (let i = 0; i < fit; i++) font.layout(run(i));
    expect(cache.size).toBe(fit);
    font.layout(run(0)); // used again: now the most recent
    font.layout(run(fit)); // one more: the oldest, run 1, makes room
    expect(cache.size).toBe(fit);
    const before = calls.length;
    font.layout(run(0));
    font.layout(run(2));
    expect(calls.length).toBe(before);
    font.layout(run(1));
    expect(calls.length).toBe(before + 1);
  });

  it("never keeps a run longer than the limit (a long note is shaped each time)", () => {
    const { font, calls } = fakeFont();
    const cache = cacheShaping(font);
    const note = "Ride two sessions, then re-check race sag. ".repeat(20);
    expect(note.length).toBeGreaterThan(SHAPING_CACHE_MAX_RUN);
    font.layout(note);
    font.layout(note);
    expect(calls).toHaveLength(2);
    expect(cache.size).toBe(0);
  });
});

describe("a sheet rendered with the cache", () => {
  it("has the same bytes as without it, and a second sheet reuses the shaped text", async () => {
    registerSheetFonts();
    const sheets = [demoSheetData(), demoSheetData({ airFork: true, draft: true, paperSize: "LETTER" })];
    // Straight through react-pdf first, before renderSetupSheet has turned the cache on.
    const plain: Buffer[] = [];
    for (const data of sheets)
      plain.push(await renderToBuffer(createElement(SetupSheet, { data }) as Parameters<typeof renderToBuffer>[0]));
    for (let round = 0; round < 2; round++) {
      for (const [i, data] of sheets.entries()) expect((await renderSetupSheet(data)).equals(plain[i]!)).toBe(true);
    }
    const regular = Font.getFont({ fontFamily: SHEET_FONT, fontWeight: 400 }) as unknown as {
      data: { layout: () => unknown };
    };
    const cache = cacheShaping(regular.data);
    const size = cache.size;
    expect(size).toBeGreaterThan(50);
    await renderSetupSheet(sheets[0]!);
    expect(cache.size).toBe(size);
  }, 60_000);
});
