// Service due dates, checked against cases computed by hand (the working is beside each case).
// Calendar facts: the Gregorian calendar (2028 is a leap year: divisible by 4, not by 100; 2029 is
// not). Time-zone facts: the IANA tz database's rules, as published: the European Union changes
// clocks at 01:00 UTC on the last Sunday of October (25 Oct 2026: CEST UTC+2 → CET UTC+1) and of
// March (29 Mar 2026); the United States at 02:00 local on the second Sunday of March (8 Mar 2026).
import { describe, expect, it } from "vitest";
import { addDays, addMonths, isCivilDate, isTimeZone, localDateOf } from "@/lib/service/civil-date";
import { MEAN_MONTH_DAYS, dueState, nextDueDates } from "@/lib/service/due-dates";
import { DEFAULT_SERVICE_INTERVALS, intervalsFor } from "@/lib/service/items";

const fork = (hours: number, months: number | null = null) => [{ item: "fork-oil" as const, hours, months }];

describe("calendar arithmetic", () => {
  it("mean Gregorian month is 146097 days / 4800 months", () => {
    // 400 Gregorian years = 97 leap years + 303 common = 97 × 366 + 303 × 365 = 146 097 days.
    expect(MEAN_MONTH_DAYS).toBeCloseTo(30.436875, 9);
  });

  it("adds days across month ends and 29 February", () => {
    expect(addDays("2026-01-31", 1)).toBe("2026-02-01");
    // 2028 is a leap year: 20 Feb + 9 days = 29 Feb, + 10 = 1 Mar.
    expect(addDays("2028-02-20", 9)).toBe("2028-02-29");
    expect(addDays("2028-02-20", 10)).toBe("2028-03-01");
    // 2027 is not: February has 28 days, so 20 Feb + 10 = 2 Mar.
    expect(addDays("2027-02-20", 10)).toBe("2027-03-02");
    expect(addDays("2026-12-31", 1)).toBe("2027-01-01");
  });

  it("adds months, keeping to the last day of a shorter month", () => {
    expect(addMonths("2028-01-31", 1)).toBe("2028-02-29"); // leap February
    expect(addMonths("2027-01-31", 1)).toBe("2027-02-28");
    expect(addMonths("2028-02-29", 12)).toBe("2029-02-28"); // no 29 Feb in 2029
    expect(addMonths("2028-02-29", 48)).toBe("2032-02-29"); // 2032 is a leap year again
    expect(addMonths("2026-03-31", 1)).toBe("2026-04-30");
    expect(addMonths("2026-08-31", 6)).toBe("2027-02-28");
    expect(addMonths("2026-11-15", 3)).toBe("2027-02-15"); // across the year end
  });

  it("knows real calendar days and zones", () => {
    expect(isCivilDate("2028-02-29")).toBe(true);
    expect(isCivilDate("2027-02-29")).toBe(false);
    expect(isCivilDate("2026-13-01")).toBe(false);
    expect(isCivilDate("26-1-1")).toBe(false);
    expect(isTimeZone("Europe/Berlin")).toBe(true);
    expect(isTimeZone("Mars/Olympus")).toBe(false);
  });
});

describe("the shop's calendar day of an instant", () => {
  it("takes the local date, not the UTC date", () => {
    // 22:30 UTC on 24 Oct 2026 is 00:30 CEST (UTC+2) on 25 Oct in Berlin.
    expect(localDateOf(new Date("2026-10-24T22:30:00Z"), "Europe/Berlin")).toBe("2026-10-25");
    expect(localDateOf(new Date("2026-10-24T22:30:00Z"), "UTC")).toBe("2026-10-24");
    // 06:30 UTC on 8 Mar 2026 is 23:30 MST (UTC−7) on 7 Mar in Denver, before the change at 02:00 local.
    expect(localDateOf(new Date("2026-03-08T06:30:00Z"), "America/Denver")).toBe("2026-03-07");
    // 09:30 UTC on 8 Mar 2026 is 03:30 MDT (UTC−6), after it.
    expect(localDateOf(new Date("2026-03-08T09:30:00Z"), "America/Denver")).toBe("2026-03-08");
  });

  it("a due date one day on is the next calendar day over the autumn change (a 25-hour day)", () => {
    // Berlin's 25 Oct 2026 lasts 25 hours. Started 00:30 local on 25 Oct; 1 day later is 26 Oct.
    // Adding 24 h to the instant instead would land at 23:30 CET on 25 Oct: the wrong day.
    const startedOn = localDateOf(new Date("2026-10-24T22:30:00Z"), "Europe/Berlin");
    expect(addDays(startedOn, 1)).toBe("2026-10-26");
    expect(localDateOf(new Date(Date.parse("2026-10-24T22:30:00Z") + 86_400_000), "Europe/Berlin")).toBe("2026-10-25");
  });
});

describe("next due dates", () => {
  it("by hours at the usual rate: 15 h at 10 h/month from 10 Jan 2026", () => {
    // 15 h / 10 h per month = 1.5 months × 30.436875 = 45.655 days → day 46.
    // 10 Jan + 21 days = 31 Jan; + 25 more = 25 Feb.
    const [due] = nextDueDates({ startedOn: "2026-01-10", hoursPerMonth: 10, logs: [], intervals: fork(15) });
    expect(due).toMatchObject({ item: "fork-oil", dueOn: "2026-02-25", by: "hours", hoursLogged: 0 });
  });

  it("the month limit wins when it comes first", () => {
    // 30 h at 2 h/month would be 15 months; 12 months from 31 Jan 2027 is 31 Jan 2028.
    const [due] = nextDueDates({ startedOn: "2027-01-31", hoursPerMonth: 2, logs: [], intervals: fork(30, 12) });
    expect(due).toMatchObject({ dueOn: "2028-01-31", by: "months" });
  });

  it("month limit from 29 February lands on 28 February", () => {
    const [due] = nextDueDates({ startedOn: "2028-02-29", hoursPerMonth: 0, logs: [], intervals: fork(30, 12) });
    expect(due).toMatchObject({ dueOn: "2029-02-28", by: "months" });
  });

  it("logged hours move the date: projection restarts at the last log", () => {
    // Started 1 Mar 2026, logged 4 h on 10 Mar and 6,5 h on 31 Mar: 10.5 h of 15.
    // 4.5 h left at 9 h/month = 0.5 month × 30.436875 = 15.22 days → 16 days after 31 Mar = 16 Apr.
    const [due] = nextDueDates({
      startedOn: "2026-03-01",
      hoursPerMonth: 9,
      logs: [
        { hours: 6.5, riddenOn: "2026-03-31" },
        { hours: 4, riddenOn: "2026-03-10" },
      ],
      intervals: fork(15),
    });
    expect(due).toMatchObject({ dueOn: "2026-04-16", by: "hours", hoursLogged: 10.5 });
  });

  it("logged hours that reach the interval make it due on that ride's day", () => {
    // 0.1 + 0.2 + 14.7 = 15.0 h reached on 20 May (no floating-point shortfall).
    const [due] = nextDueDates({
      startedOn: "2026-05-01",
      hoursPerMonth: 1,
      logs: [
        { hours: 0.1, riddenOn: "2026-05-02" },
        { hours: 0.2, riddenOn: "2026-05-03" },
        { hours: 14.7, riddenOn: "2026-05-20" },
        { hours: 3, riddenOn: "2026-05-25" },
      ],
      intervals: fork(15),
    });
    expect(due).toMatchObject({ dueOn: "2026-05-20", by: "hours", hoursLogged: 18 });
  });

  it("hours ridden before the service clock started do not count", () => {
    // The 20 h of 28 Feb precede the start on 1 Mar; 15 h at 30 h/month = 0.5 month → 16 days → 17 Mar.
    const [due] = nextDueDates({
      startedOn: "2026-03-01",
      hoursPerMonth: 30,
      logs: [{ hours: 20, riddenOn: "2026-02-28" }],
      intervals: fork(15),
    });
    expect(due).toMatchObject({ dueOn: "2026-03-17", hoursLogged: 0 });
  });

  it("a projection across 29 February counts the leap day", () => {
    // 10 h at 10 h/month = 30.436875 days → 31 days. 1 Feb 2028 + 31 days = 3 Mar (Feb has 29 days);
    // in 2027, 1 Feb + 31 = 4 Mar.
    const at = (startedOn: string) =>
      nextDueDates({ startedOn, hoursPerMonth: 10, logs: [], intervals: fork(10) })[0]!.dueOn;
    expect(at("2028-02-01")).toBe("2028-03-03");
    expect(at("2027-02-01")).toBe("2027-03-04");
  });

  it("nothing to go on gives no date", () => {
    const [due] = nextDueDates({ startedOn: "2026-03-01", hoursPerMonth: null, logs: [], intervals: fork(15) });
    expect(due).toMatchObject({ dueOn: null, by: null });
  });

  it("states a date today against the notice period", () => {
    expect(dueState("2026-12-01", "2026-12-02", 14)).toBe("overdue");
    expect(dueState("2026-12-02", "2026-12-02", 14)).toBe("due-soon");
    expect(dueState("2026-12-16", "2026-12-02", 14)).toBe("due-soon"); // 14 days on
    expect(dueState("2026-12-17", "2026-12-02", 14)).toBe("later");
    expect(dueState(null, "2026-12-02", 14)).toBe("unknown");
  });
});

describe("intervals by discipline", () => {
  it("a discipline's own row, else the shop's row for any discipline", () => {
    const mx = intervalsFor("motocross", DEFAULT_SERVICE_INTERVALS);
    const trail = intervalsFor("trail", DEFAULT_SERVICE_INTERVALS);
    expect(mx.find((i) => i.item === "fork-oil")?.hours).toBe(15);
    expect(trail.find((i) => i.item === "fork-oil")?.hours).toBe(30);
    expect(trail.map((i) => i.item)).toEqual(["fork-oil", "shock-service", "full-rebuild"]);
  });
});
