// Typed dates in the queue's "Received from/to" (lib/validations/typed-day.ts): every usual way of
// writing 25 November 2026 gives the ISO 8601 calendar date 2026-11-25; impossible dates give null.
import { describe, expect, it } from "vitest";
import { parseTypedDay } from "@/lib/validations/typed-day";

describe("parseTypedDay", () => {
  it.each([
    "2026-11-25",
    "2026/11/25",
    "25.11.2026",
    "25/11/2026",
    "25-11-26",
    "11/25/2026",
    "25112026",
    // The digits a US date field turned into 11/25/0006: month first is the only real date.
    "11252026",
    "20261125",
    "25 Nov 2026",
    "25 november 2026",
    "Nov 25, 2026",
  ])("%s is 2026-11-25", (text) => {
    expect(parseTypedDay(text)).toBe("2026-11-25");
  });

  it("reads an ambiguous day and month day first, as the app writes dates", () => {
    expect(parseTypedDay("03/04/2026")).toBe("2026-04-03");
  });

  it.each(["", "yesterday", "31.02.2026", "2026-13-01", "32/01/2026", "1125"])("%j is no date", (text) => {
    expect(parseTypedDay(text)).toBeNull();
  });

  it("knows leap years (Gregorian rule: 2028 is one, 2100 is not)", () => {
    expect(parseTypedDay("29.02.2028")).toBe("2028-02-29");
    expect(parseTypedDay("29.02.2100")).toBeNull();
  });
});
