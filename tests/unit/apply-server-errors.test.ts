// Server 400 `fields` (lib/api/respond.ts fieldErrors, produced by the same schemas the routes use)
// are put back onto the admin forms' own field paths.
import { describe, expect, it } from "vitest";
import { applyServerErrors, errorAt, serverErrorsToForm, toNumber } from "@/components/forms/apply-server-errors";
import { fieldErrors } from "@/lib/api/respond";
import { saveTargetSchema } from "@/lib/validations/targets";
import { inviteSchema } from "@/lib/validations/team";

const row = {
  sag: {
    rearRace: 0.33,
    rearStaticMin: 0.08,
    rearStaticMax: 0.12,
    forkRace: 0.3,
    forkStaticMin: 0.05,
    forkStaticMax: 0.1,
  },
  riderRearShare: 0.65,
  rateFactor: 1,
  bottomingFactor: 1,
};

describe("serverErrorsToForm", () => {
  it("strips the payload wrapper of a form that edits only part of the body", () => {
    const parsed = saveTargetSchema.safeParse({
      discipline: "enduro",
      skill: "expert",
      values: { ...row, riderRearShare: 2 },
    });
    expect(parsed.success).toBe(false);
    const server = fieldErrors(parsed.error!);
    expect(server).toEqual({ "values.riderRearShare": "At most 0.95" });
    expect(serverErrorsToForm(server, { prefix: "values." })).toEqual({
      placed: [["riderRearShare", "At most 0.95"]],
      unplaced: [],
    });
  });

  it("keeps nested paths and list indexes", () => {
    const result = serverErrorsToForm({
      "spec.rear.leverageCurve.2.ratio": "Too high",
      "rules.0.reason": "Give a reason",
    });
    expect(result.placed).toEqual([
      ["spec.rear.leverageCurve.2.ratio", "Too high"],
      ["rules.0.reason", "Give a reason"],
    ]);
  });

  it("returns messages with no field in the form (body-level, other keys, outside the prefix)", () => {
    const parsed = saveTargetSchema.safeParse({ discipline: "ice", skill: "expert", values: row });
    const server = { ...fieldErrors(parsed.error!), _: "Body must be JSON" };
    const { placed, unplaced } = serverErrorsToForm(server, { prefix: "values." });
    expect(placed).toEqual([]);
    expect(unplaced).toHaveLength(2);
    expect(unplaced).toContain("Body must be JSON");
  });

  it("only places top-level names the form lists", () => {
    expect(serverErrorsToForm({ email: "Taken", token: "Expired" }, { fields: ["email", "role"] })).toEqual({
      placed: [["email", "Taken"]],
      unplaced: ["Expired"],
    });
  });
});

describe("applyServerErrors", () => {
  it("calls setError per placed field with the server's message", () => {
    const parsed = inviteSchema.safeParse({ email: "not-an-address", role: "owner" });
    const calls: [string, { type?: string; message?: string }][] = [];
    const unplaced = applyServerErrors((name, error) => void calls.push([name, error]), fieldErrors(parsed.error!), {
      fields: ["email", "role"],
    });
    expect(unplaced).toEqual([]);
    expect(calls).toEqual([
      [
        "email",
        {
          type: "server",
          message: "This is not an e-mail address: it needs a name, an @ and a domain, like sam@example.com",
        },
      ],
      ["role", { type: "server", message: "Choose tuner or admin" }],
    ]);
  });
});

describe("errorAt", () => {
  it("reads a field's message and a list's own message (plain or under root)", () => {
    const errors = {
      spec: {
        rear: { shockStrokeMm: { message: "Stroke" }, leverageCurve: { root: { message: "Two points at least" } } },
      },
    };
    expect(errorAt(errors, "spec.rear.shockStrokeMm")).toBe("Stroke");
    expect(errorAt(errors, "spec.rear.leverageCurve")).toBe("Two points at least");
    expect(errorAt({ rules: { message: "Too many" } }, "rules")).toBe("Too many");
    expect(errorAt(errors, "spec.fork.travelMm")).toBeUndefined();
  });
});

describe("toNumber", () => {
  it("turns typed text into the number the schema checks", () => {
    expect(toNumber()("12.5")).toBe(12.5);
    expect(toNumber()(" 1,5 ")).toBe(1.5);
    expect(toNumber()("")).toBeUndefined();
    expect(toNumber(null)("")).toBeNull();
    expect(toNumber()("abc")).toBeNaN();
    expect(toNumber()(42)).toBe(42);
  });
});
