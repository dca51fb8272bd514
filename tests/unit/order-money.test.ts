// Order money (lib/orders/money.ts): integer minor units, tax on the net subtotal, rounding half away
// from zero. Every expected value is computed by hand beside it.
import { describe, expect, it } from "vitest";
import {
  currencyDigits,
  depositMinor,
  divRoundHalfAwayFromZero,
  orderTotals,
  parseMajorToMinor,
} from "@/lib/orders/money";
import { formatMoney } from "@/lib/format";

describe("rounding half away from zero", () => {
  it("rounds exact halves away from zero and everything else to the nearest", () => {
    // 25 / 2 = 12.5 → 13; −25 / 2 = −12.5 → −13 (hand-computed)
    expect(divRoundHalfAwayFromZero(25n, 2n)).toBe(13n);
    expect(divRoundHalfAwayFromZero(-25n, 2n)).toBe(-13n);
    // 7 / 3 = 2.33… → 2; 8 / 3 = 2.67 → 3 (hand-computed)
    expect(divRoundHalfAwayFromZero(7n, 3n)).toBe(2n);
    expect(divRoundHalfAwayFromZero(8n, 3n)).toBe(3n);
  });
});

describe("order totals (tax on the net subtotal, in basis points)", () => {
  it("adds 20 % on 2 × 65.00 + 180.00 = 310.00 → tax 62.00, total 372.00 (hand-computed)", () => {
    const totals = orderTotals(
      [
        { quantity: 2, unitPriceMinor: 6500 },
        { quantity: 1, unitPriceMinor: 18000 },
      ],
      2000,
    );
    expect(totals).toEqual({ subtotalMinor: 31000, taxMinor: 6200, totalMinor: 37200 });
  });

  it("rounds 19 % of 19.99 = 3.7981 up to 3.80 (hand-computed)", () => {
    expect(orderTotals([{ quantity: 1, unitPriceMinor: 1999 }], 1900)).toEqual({
      subtotalMinor: 1999,
      taxMinor: 380,
      totalMinor: 2379,
    });
  });

  it("rounds an exact half cent away from zero: 10 % of 1.25 = 0.125 → 0.13 (hand-computed)", () => {
    expect(orderTotals([{ quantity: 1, unitPriceMinor: 125 }], 1000).taxMinor).toBe(13);
  });

  it("rounds 7.7 % of 0.35 = 0.02695 to 0.03 and 8.1 % of 12.34 = 0.99954 to 1.00 (hand-computed)", () => {
    expect(orderTotals([{ quantity: 1, unitPriceMinor: 35 }], 770).taxMinor).toBe(3);
    expect(orderTotals([{ quantity: 1, unitPriceMinor: 1234 }], 810).taxMinor).toBe(100);
  });

  it("has no tax at 0 % and nothing to pay for no lines", () => {
    expect(orderTotals([{ quantity: 3, unitPriceMinor: 999 }], 0)).toEqual({
      subtotalMinor: 2997,
      taxMinor: 0,
      totalMinor: 2997,
    });
    expect(orderTotals([], 2000).totalMinor).toBe(0);
  });

  it("keeps sums past 2^53 exact in BigInt and refuses a total it cannot return as a safe number", () => {
    expect(() => orderTotals([{ quantity: 99, unitPriceMinor: Number.MAX_SAFE_INTEGER }], 0)).toThrow(RangeError);
  });
});

describe("deposit", () => {
  it("takes 30 % of 372.00 = 111.60 and 30 % of 23.79 = 7.137 → 7.14 (hand-computed)", () => {
    expect(depositMinor(37200, 30)).toBe(11160);
    expect(depositMinor(2379, 30)).toBe(714);
  });
});

describe("currencies", () => {
  it("knows the minor unit of a currency from ISO 4217 (EUR 2 digits, JPY 0, BHD 3)", () => {
    expect(currencyDigits("EUR")).toBe(2);
    expect(currencyDigits("JPY")).toBe(0);
    expect(currencyDigits("BHD")).toBe(3);
  });

  it("reads amounts typed with a point or a comma into minor units", () => {
    expect(parseMajorToMinor("12,5", "EUR")).toBe(1250);
    expect(parseMajorToMinor("180.00", "EUR")).toBe(18000);
    expect(parseMajorToMinor("1500", "JPY")).toBe(1500);
    expect(parseMajorToMinor("1.5", "JPY")).toBeNull();
    expect(parseMajorToMinor("12.345", "EUR")).toBeNull();
    expect(parseMajorToMinor("-3", "EUR")).toBeNull();
  });

  it("writes minor units with the currency's symbol (CLDR en-GB patterns)", () => {
    expect(formatMoney(37200, "EUR")).toBe("€372.00");
    expect(formatMoney(1500, "JPY")).toBe("JP¥1,500");
  });
});
