// The shop's admin forms in the browser after the move to react-hook-form: inline errors from the
// shared schemas, server 400 `fields` shown beside the field (the server stays the authority), typed
// input kept, and the calculators' live results. Nothing here saves: other e2e files share the server.
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Page } from "playwright-core";
import { openBrowser, type Browsing } from "./browser";

const baseUrl = inject("baseUrl");
const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "sagwise-demo";

describe("admin forms", () => {
  let browsing: Browsing;
  let page: Page;

  beforeAll(async () => {
    browsing = await openBrowser();
    page = await browsing.context.newPage();
    await page.goto(`${baseUrl}/sign-in?next=/shop/tools`);
    const form = page.getByRole("form", { name: "Staff sign-in" });
    await form.getByLabel("E-mail").fill("owner@sagwise.test");
    await form.getByLabel("Password").fill(DEMO_PASSWORD);
    await form.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(`${baseUrl}/shop/tools`);
  });
  afterAll(() => browsing.close());

  it("rate converter: 1 kgf/mm is 9.807 N/mm, and text that is no number is refused inline", async () => {
    const card = page.getByRole("region", { name: "Rate unit converter" });
    await card.getByLabel("Rate", { exact: true }).fill("1");
    // NIST SP 811 (2008) B.8: 1 kgf = 9.80665 N exactly, so 1 kgf/mm = 9.80665 N/mm.
    const results = card.getByRole("definition");
    await expect.poll(() => card.locator("dl").textContent()).toContain("9.807");
    expect(await results.count()).toBe(3);
    await card.getByLabel("Rate", { exact: true }).fill("abc");
    await expect.poll(() => card.locator("#conv-value-error").textContent()).toBe("Enter a rate");
    expect(await card.locator("dl").count()).toBe(0);
    expect(await card.getByLabel("Rate", { exact: true }).inputValue()).toBe("abc");
  });

  it("load test: two points give the slope; equal lengths are named on the second length", async () => {
    const card = page.getByRole("region", { name: "Rate from a two-point load test" });
    await card.getByLabel("First length L₁ (mm)").fill("100");
    await card.getByLabel("Force at L₁").fill("0");
    await card.getByLabel("Second length L₂ (mm)").fill("90");
    await card.getByLabel("Force at L₂").fill("100");
    // Hooke's law: k = (100 N − 0 N) / (100 mm − 90 mm) = 10 N/mm.
    await expect.poll(() => card.getByRole("definition").first().textContent()).toMatch(/^10\.00 N\/mm/);
    await card.getByLabel("Second length L₂ (mm)").fill("100");
    await expect.poll(() => card.locator("#lt-length2Mm-error").textContent()).toBe("The two lengths must differ");
  });

  it("settings: a cross-field rule is checked in the browser before anything is sent", async () => {
    await page.goto(`${baseUrl}/shop/settings`);
    const form = page.getByRole("form", { name: "Shop settings" });
    let sent = 0;
    await page.route("**/api/shop/settings", (route) => {
      sent += 1;
      return route.abort();
    });
    await form.getByLabel("Front/rear frequency ratio, least").fill("1.2");
    await form.getByLabel("Front/rear frequency ratio, most").fill("1.1");
    await form.getByRole("button", { name: "Save settings" }).click();
    await expect.poll(() => form.locator("#frequencyRatioMax-error").textContent()).toBe("Must be above the minimum");
    expect(sent).toBe(0);
    await page.unroute("**/api/shop/settings");
  });

  it("settings: the server's 400 fields appear beside their inputs and the typed values stay", async () => {
    await page.goto(`${baseUrl}/shop/settings`);
    const form = page.getByRole("form", { name: "Shop settings" });
    // Stand in for a server that refuses what the browser accepted (the server is the authority).
    await page.route("**/api/shop/settings", (route) =>
      route.fulfill({ status: 400, contentType: "application/json", body: JSON.stringify({ error: "Some fields need attention.", fields: { gearMassKg: "Refused by the server", _: "Body-level note" } }) }),
    );
    await form.getByLabel("Riding gear mass (kg)").fill("12.5");
    await form.getByRole("button", { name: "Save settings" }).click();
    const gear = form.getByLabel("Riding gear mass (kg)");
    await expect.poll(() => form.locator("#gearMassKg-error").textContent()).toBe("Refused by the server");
    expect(await gear.getAttribute("aria-invalid")).toBe("true");
    expect(await gear.getAttribute("aria-describedby")).toContain("gearMassKg-error");
    expect(await gear.inputValue()).toBe("12.5");
    expect(await form.getByRole("alert").filter({ hasText: "Body-level note" }).count()).toBe(1);
    await page.unroute("**/api/shop/settings");
  });

  it("targets: sag is typed in % with mm for the reference bike; the race-sag rule is checked before sending", async () => {
    await page.goto(`${baseUrl}/shop/targets`);
    let sent = 0;
    await page.route("**/api/shop/targets", (route) => ((sent += 1), route.abort()));
    const race = page.getByLabel("Rear race sag (% of travel)");
    await race.fill("33");
    // The hint is the fraction times the bike's rear travel: 0.33 × travel, rounded to the mm.
    const hint = (await page.locator("#sag-rearRace-hint").textContent()) ?? "";
    const [, mm, travel] = /^(\d+) mm on (\d+) mm of rear travel$/.exec(hint) ?? [];
    expect(Number(mm)).toBe(Math.round(0.33 * Number(travel)));
    await race.fill("5");
    await page.getByRole("button", { name: "Save row" }).click();
    await expect.poll(() => page.locator("#sag-rearRace-error").textContent()).toBe("Race sag must exceed the static sag window");
    expect(await race.inputValue()).toBe("5");
    expect(sent).toBe(0);
    await page.unroute("**/api/shop/targets");
  });

  it("clicker rules: a rule added to the table needs a reason; removing it restores the table", async () => {
    let sent = 0;
    await page.route("**/api/shop/targets/rules", (route) => ((sent += 1), route.abort()));
    const rules = page.getByRole("region", { name: "Clicker rules" });
    const rows = await rules.getByRole("row").count();
    await rules.getByRole("button", { name: "Add rule" }).click();
    const n = rows; // header row + (rows − 1) rules, so the new rule is number `rows`
    const reason = rules.getByLabel(`Rule ${n} reason`);
    expect(await reason.inputValue()).toBe("");
    await rules.getByRole("button", { name: "Save rules" }).click();
    await expect.poll(() => reason.getAttribute("aria-invalid")).toBe("true");
    expect(sent).toBe(0);
    await rules.getByRole("button", { name: `Remove rule ${n}` }).click();
    expect(await rules.getByRole("row").count()).toBe(rows);
    await page.unroute("**/api/shop/targets/rules");
  });

  it("stock: a shock spring above 400 N/mm is refused on the rate field, whatever unit it was typed in", async () => {
    await page.goto(`${baseUrl}/shop/stock`);
    let sent = 0;
    await page.route("**/api/shop/stock", (route) => ((sent += 1), route.abort()));
    const form = page.getByRole("form", { name: "Add a spring" });
    await form.getByLabel("Rate", { exact: true }).fill("2300");
    await form.getByLabel("Rate unit").selectOption("lbf/in");
    // 2300 lbf/in × 0.175127 N/mm per lbf/in = 402.8 N/mm (NIST SP 811 B.8): just above the 400 N/mm ceiling.
    await form.getByRole("button", { name: "Add spring" }).click();
    await expect.poll(() => form.locator("#new-rate-error").textContent()).toBe("A shock spring above 400 N/mm is not plausible");
    await form.getByLabel("Rate", { exact: true }).fill("2200");
    // 2200 lbf/in = 385.3 N/mm: accepted, so the error clears.
    await expect.poll(() => form.locator("#new-rate-error").count()).toBe(0);
    expect(sent).toBe(0);
    await page.unroute("**/api/shop/stock");
  });
});
