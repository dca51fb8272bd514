// The shop's admin forms in the browser after the move to react-hook-form: inline errors from the
// shared schemas, server 400 `fields` shown beside the field (the server stays the authority), typed
// input kept, and the calculators' live results. Nothing here saves: other e2e files share the server.
import { expect, signInWithPassword, test } from "./support/fixtures";

test.describe("admin forms", () => {
  // Each test signs the admin in in its own browser context and opens the page it checks.
  test.beforeEach(async ({ page }) => {
    await signInWithPassword(page, "owner@sagwise.test", "/shop/tools");
  });

  test("rate converter: 1 kgf/mm is 9.807 N/mm, and text that is no number is refused inline", async ({ page }) => {
    const card = page.getByRole("region", { name: "Rate unit converter" });
    await card.getByLabel("Rate", { exact: true }).fill("1");
    // NIST SP 811 (2008) B.8: 1 kgf = 9.80665 N exactly, so 1 kgf/mm = 9.80665 N/mm.
    await expect(card.locator("dl")).toContainText("9.807");
    await expect(card.getByRole("definition")).toHaveCount(3);
    await card.getByLabel("Rate", { exact: true }).fill("abc");
    await expect(card.locator("#conv-value-error")).toHaveText("Enter a rate");
    await expect(card.locator("dl")).toHaveCount(0);
    await expect(card.getByLabel("Rate", { exact: true })).toHaveValue("abc");
  });

  test("load test: two points give the slope; equal lengths are named on the second length", async ({ page }) => {
    const card = page.getByRole("region", { name: "Rate from a two-point load test" });
    await card.getByLabel("First length L₁ (mm)").fill("100");
    await card.getByLabel("Force at L₁").fill("0");
    await card.getByLabel("Second length L₂ (mm)").fill("90");
    await card.getByLabel("Force at L₂").fill("100");
    // Hooke's law: k = (100 N − 0 N) / (100 mm − 90 mm) = 10 N/mm.
    await expect(card.getByRole("definition").first()).toHaveText(/^10\.00 N\/mm/);
    await card.getByLabel("Second length L₂ (mm)").fill("100");
    await expect(card.locator("#lt-length2Mm-error")).toHaveText("The two lengths must differ");
  });

  test("settings: a cross-field rule is checked in the browser before anything is sent", async ({ page }) => {
    await page.goto(`/shop/settings`);
    const form = page.getByRole("form", { name: "Shop settings" });
    let sent = 0;
    await page.route("**/api/shop/settings", (route) => {
      sent += 1;
      return route.abort();
    });
    await form.getByLabel("Front/rear frequency ratio, least").fill("1.2");
    await form.getByLabel("Front/rear frequency ratio, most").fill("1.1");
    await form.getByRole("button", { name: "Save settings" }).click();
    await expect(form.locator("#frequencyRatioMax-error")).toHaveText("Must be above the minimum");
    expect(sent).toBe(0);
    await page.unroute("**/api/shop/settings");
  });

  test("settings: the server's 400 fields appear beside their inputs and the typed values stay", async ({ page }) => {
    await page.goto(`/shop/settings`);
    const form = page.getByRole("form", { name: "Shop settings" });
    // Stand in for a server that refuses what the browser accepted (the server is the authority).
    await page.route("**/api/shop/settings", (route) =>
      route.fulfill({
        status: 400,
        contentType: "application/json",
        body: JSON.stringify({
          error: "Some fields need attention.",
          fields: { gearMassKg: "Refused by the server", _: "Body-level note" },
        }),
      }),
    );
    await form.getByLabel("Riding gear mass (kg)").fill("12.5");
    await form.getByRole("button", { name: "Save settings" }).click();
    const gear = form.getByLabel("Riding gear mass (kg)");
    await expect(form.locator("#gearMassKg-error")).toHaveText("Refused by the server");
    await expect(gear).toHaveAttribute("aria-invalid", "true");
    await expect(gear).toHaveAttribute("aria-describedby", /gearMassKg-error/);
    await expect(gear).toHaveValue("12.5");
    await expect(form.getByRole("alert").filter({ hasText: "Body-level note" })).toHaveCount(1);
    await page.unroute("**/api/shop/settings");
  });

  test("targets: sag is typed in % with mm for the reference bike; the race-sag rule is checked before sending", async ({
    page,
  }) => {
    await page.goto(`/shop/targets`);
    let sent = 0;
    await page.route("**/api/shop/targets", (route) => ((sent += 1), route.abort()));
    const race = page.getByLabel("Rear race sag (% of travel)");
    const hint = page.locator("#sag-rearRace-hint");
    await race.fill("33");
    // The hint is the fraction times the bike's rear travel: 0.33 × travel, rounded to the mm. The
    // travel is the reference bike's, whatever the sag: read it, then wait for the hint to follow.
    await expect(hint).toHaveText(/^\d+ mm on \d+ mm of rear travel$/);
    const travel = Number(/on (\d+) mm of rear travel$/.exec((await hint.textContent()) ?? "")?.[1]);
    expect(travel).toBeGreaterThan(0);
    await expect(hint).toHaveText(`${Math.round(0.33 * travel)} mm on ${travel} mm of rear travel`);
    await race.fill("5");
    await page.getByRole("button", { name: "Save row" }).click();
    await expect(page.locator("#sag-rearRace-error")).toHaveText("Race sag must exceed the static sag window");
    await expect(race).toHaveValue("5");
    expect(sent).toBe(0);
    await page.unroute("**/api/shop/targets");
  });

  test("clicker rules: a rule added to the table needs a reason; removing it restores the table", async ({ page }) => {
    await page.goto("/shop/targets");
    let sent = 0;
    await page.route("**/api/shop/targets/rules", (route) => ((sent += 1), route.abort()));
    const rules = page.getByRole("region", { name: "Clicker rules" });
    await expect(rules.getByRole("button", { name: "Add rule" })).toBeVisible();
    const rows = await rules.getByRole("row").count();
    await rules.getByRole("button", { name: "Add rule" }).click();
    const n = rows; // header row + (rows − 1) rules, so the new rule is number `rows`
    const reason = rules.getByLabel(`Rule ${n} reason`);
    await expect(reason).toHaveValue("");
    await rules.getByRole("button", { name: "Save rules" }).click();
    await expect(reason).toHaveAttribute("aria-invalid", "true");
    expect(sent).toBe(0);
    await rules.getByRole("button", { name: `Remove rule ${n}` }).click();
    await expect(rules.getByRole("row")).toHaveCount(rows);
    await page.unroute("**/api/shop/targets/rules");
  });

  test("stock: a shock spring above 400 N/mm is refused on the rate field, whatever unit it was typed in", async ({
    page,
  }) => {
    await page.goto(`/shop/stock`);
    let sent = 0;
    await page.route("**/api/shop/stock", (route) => ((sent += 1), route.abort()));
    const form = page.getByRole("form", { name: "Add a spring" });
    await form.getByLabel("Rate", { exact: true }).fill("2300");
    await form.getByLabel("Rate unit").selectOption("lbf/in");
    // 2300 lbf/in × 0.175127 N/mm per lbf/in = 402.8 N/mm (NIST SP 811 B.8): just above the 400 N/mm ceiling.
    await form.getByRole("button", { name: "Add spring" }).click();
    await expect(form.locator("#new-rate-error")).toHaveText("A shock spring above 400 N/mm is not plausible");
    await form.getByLabel("Rate", { exact: true }).fill("2200");
    // 2200 lbf/in = 385.3 N/mm: accepted, so the error clears.
    await expect(form.locator("#new-rate-error")).toHaveCount(0);
    expect(sent).toBe(0);
    await page.unroute("**/api/shop/stock");
  });
});
