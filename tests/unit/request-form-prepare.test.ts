// What the form holds (strings, empty fields, the picker's choice) becomes the answers the shared
// schemas accept; empty means "not given", never 0; missing answers get a message naming the field.
import { describe, expect, it } from "vitest";
import { clean, NOT_LISTED, prepareBike, prepareStep } from "@/components/request-form/prepare";
import { friendlyError } from "@/lib/validations/messages";
import { bikeStepSchema, feelStepSchema, riderStepSchema } from "@/lib/validations/request";
import { sagReportSchema } from "@/lib/validations/status";

describe("clean", () => {
  it("drops empty fields and measures with no value, keeps 0 and false", () => {
    expect(
      clean({ name: "A", phone: "", weight: { value: "", unit: "kg" }, gearIncluded: false, hours: 0, terrain: [] }),
    ).toEqual({ name: "A", gearIncluded: false, hours: 0, terrain: [] });
    expect(clean({ unit: "mm", rearStatic: "", rearRace: "" })).toBeUndefined();
    expect(clean({ unit: "in", rearRace: "4.1" })).toEqual({ unit: "in", rearRace: "4.1" });
  });
});

describe("prepareBike", () => {
  const notListed = {
    description: "Old twin-shock",
    rearWheelTravel: { value: "4", unit: "in" },
    forkTravel: { value: "", unit: "in" },
    mass: { value: "", unit: "lb" },
  };
  it("a catalog pick keeps the model id and drops the not-listed figures", () => {
    expect(prepareBike({ modelId: "m1", bikeName: "Bike", notListed, year: "" })).toEqual({ modelId: "m1" });
  });
  it("“not listed” sends null and the figures given", () => {
    expect(prepareBike({ modelId: NOT_LISTED, bikeName: "", notListed, year: "1979" })).toEqual({
      modelId: null,
      year: "1979",
      notListed: { description: "Old twin-shock", rearWheelTravel: { value: "4", unit: "in" } },
    });
  });
  it("the fork travel left empty is named by the shared schema", () => {
    const result = bikeStepSchema.safeParse(prepareStep("bike", { modelId: NOT_LISTED, notListed }), {
      error: friendlyError,
    });
    expect(result.success).toBe(false);
    const issue = result.error!.issues.find((i) => i.path.join(".") === "notListed.forkTravel");
    expect(issue?.message).toBe("Enter the fork travel");
  });
});

describe("friendlyError on the shared schemas", () => {
  it("names each missing answer of the rider step", () => {
    const result = riderStepSchema.safeParse(
      prepareStep("rider", {
        name: "",
        email: "",
        weight: { value: "", unit: "lb" },
        gearIncluded: false,
        skill: "",
        style: "",
      }),
      { error: friendlyError },
    );
    const messages = Object.fromEntries(result.error!.issues.map((i) => [i.path.join("."), i.message]));
    expect(messages).toEqual({
      name: "Enter your name",
      email: "Enter your e-mail address",
      weight: "Enter your weight",
      skill: "Choose your skill level",
      style: "Choose your riding style",
    });
  });
  it("keeps a schema's own message (a typed weight that is not a number)", () => {
    const result = riderStepSchema.safeParse(
      prepareStep("rider", {
        name: "Al",
        email: "al@example.test",
        weight: { value: "heavy", unit: "kg" },
        gearIncluded: true,
        skill: "pro",
        style: "smooth",
      }),
      { error: friendlyError },
    );
    expect(result.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["weight.value", "Enter the weight as a number"],
    ]);
  });
  it("the feel step takes sag as given, in inches, from strings", () => {
    const parsed = feelStepSchema.parse(
      prepareStep("feel", {
        complaints: [],
        notes: "",
        currentSag: { unit: "in", rearStatic: "1.4", rearRace: "", forkStatic: "", forkRace: "" },
      }),
    );
    expect(parsed.currentSag).toEqual({ unit: "in", rearStatic: 1.4 });
  });
});

describe("sagReportSchema", () => {
  it("needs static and race together for an end, race larger than static, and at least one end", () => {
    const bad = sagReportSchema.safeParse(
      { unit: "mm", front: { free: "", static: "", race: "" }, rear: { free: "", static: "40", race: "" } },
      { error: friendlyError },
    );
    expect(bad.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["rear.race", "Enter the rear race sag"],
    ]);
    const order = sagReportSchema.safeParse({ unit: "mm", front: {}, rear: { static: "40", race: "35" } });
    expect(order.error!.issues[0]!.message).toMatch(/larger than static/);
    const none = sagReportSchema.safeParse({ unit: "mm", front: {}, rear: {} });
    expect(none.error!.issues[0]!.message).toBe("Enter the sag for at least one end");
    expect(
      sagReportSchema.parse({ unit: "in", front: {}, rear: { free: "", static: "1.3", race: "4.1" } }).rear,
    ).toEqual({ static: 1.3, race: 4.1 });
  });
});
