// The one formatting module (lib/format.ts). Expected strings follow the CLDR English (United
// Kingdom) patterns that Intl implements (ECMA-402): "d MMM y" for the medium date, "HH:mm" for the
// short time; the ISO day is ISO 8601's calendar date YYYY-MM-DD.
import { describe, expect, it } from "vitest";
import { formatDateTime, formatDay, formatNumber, isoDay } from "@/lib/format";

// 23:30 UTC on 31 December: the next day in zones east of UTC, so a local-time formatter would differ.
const NEW_YEARS_EVE = new Date(Date.UTC(2026, 11, 31, 23, 30));

describe("dates, always in UTC", () => {
  it("writes the day as d MMM y", () => {
    expect(formatDay(NEW_YEARS_EVE)).toBe("31 Dec 2026");
    expect(formatDay("2027-03-05T00:00:00Z")).toBe("5 Mar 2027");
  });

  it("writes day and time with the zone named", () => {
    expect(formatDateTime(NEW_YEARS_EVE)).toBe("31 Dec 2026, 23:30 UTC");
  });

  it("writes the ISO 8601 calendar date for file names", () => {
    expect(isoDay(NEW_YEARS_EVE)).toBe("2026-12-31");
  });
});

describe("numbers", () => {
  it("rounds to the digits asked, with a point and no grouping", () => {
    expect(formatNumber(1234.5, 2)).toBe("1234.50");
    expect(formatNumber(52.549, 1)).toBe("52.5");
    expect(formatNumber(26.5, 0)).toBe("27"); // ECMA-402 rounds half away from zero ("halfExpand")
  });

  it("never shows a signed zero", () => {
    expect(formatNumber(-0.01, 1)).toBe("0.0");
    expect(formatNumber(-0.4, 0)).toBe("0");
    expect(formatNumber(-1.25, 1)).toBe("-1.3");
  });
});
