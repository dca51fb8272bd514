// The queue's typed-date filter (components/forms/day-field.ts) against the order events arrive in a
// browser: the URL's value for what the field sent can land after the tuner has typed more. The
// first case is the sequence a browser test of the queue hit: clear, type an impossible date, and
// the late echo of the clearing wiped the impossible date before its warning could show.
import { describe, expect, it } from "vitest";
import { dayField, receiveDay, typeDay } from "@/components/forms/day-field";

function type(field: ReturnType<typeof dayField>, ...texts: string[]) {
  const sent: string[] = [];
  for (const text of texts) {
    const typed = typeDay(field, text);
    field = typed.field;
    if (typed.send !== null) sent.push(typed.send);
  }
  return { field, sent };
}

describe("typed-date field", () => {
  it("keeps an impossible date typed after clearing when the clearing's echo lands late", () => {
    let { field, sent } = type(dayField(""), "11252026");
    expect(sent).toEqual(["2026-11-25"]);
    field = receiveDay(field, "2026-11-25");
    ({ field, sent } = type(field, "", "31.02.2026"));
    expect(sent).toEqual([""]); // 31 February is no date (ISO 8601 calendar): nothing sent for it
    field = receiveDay(field, "");
    expect(field.text).toBe("31.02.2026");
  });

  it("keeps the latest text when an earlier send's echo lands after a later one was sent", () => {
    const typed = type(dayField(""), "2026-11-2", "2026-11-25");
    let field = typed.field;
    expect(typed.sent).toEqual(["2026-11-02", "2026-11-25"]);
    field = receiveDay(field, "2026-11-02");
    expect(field.text).toBe("2026-11-25");
    field = receiveDay(field, "2026-11-25");
    expect(field.text).toBe("2026-11-25");
    expect(field.pending).toEqual([]);
  });

  it("shows a value that came from outside: clear filters, then the back button", () => {
    let { field } = type(dayField(""), "25.11.2026");
    field = receiveDay(field, "2026-11-25");
    field = receiveDay(field, "");
    expect(field.text).toBe("");
    field = receiveDay(field, "2026-11-25");
    expect(field.text).toBe("25 Nov 2026");
  });

  it("starts from the URL's value written the app's way", () => {
    expect(dayField("2026-11-25").text).toBe("25 Nov 2026");
    expect(dayField("").text).toBe("");
  });

  it("lets an outside value win over a send still in flight", () => {
    let { field } = type(dayField(""), "25.11.2026");
    // The back button lands first: the URL is what the list shows, so the field follows it.
    field = receiveDay(field, "2026-11-20");
    expect(field.text).toBe("20 Nov 2026");
    expect(field.pending).toEqual([]);
  });

  it("keeps the text as typed when the value that arrives is the day it reads as", () => {
    const { field } = type(dayField(""), "11252026");
    expect(receiveDay({ ...field, pending: [] }, "2026-11-25").text).toBe("11252026");
  });
});
