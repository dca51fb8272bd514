// Service intervals in Chromium: the rider logs riding hours on the status page at phone size
// (390×844) with a decimal comma and sees the dates move; a reminder's link opens the request form
// with the bike chosen; staff see who is due on the due-soon list; the admin's intervals page refuses
// a bad figure beside its field. Due dates are hand-computed here from the common-practice intervals
// (lib/service/items.ts: motocross fork oil 15 h, shock service 25 h) and the mean Gregorian month
// (30.436875 days), on the demo shop's calendar (UTC).
import type { Page } from "@playwright/test";
import { stableUuid } from "@/db/seed-data";
import { expect, signInWithPassword, test, uniqueStamp } from "./support/fixtures";
import { answersLike } from "./support/requests";

const DAY = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });
/** "7 Dec 2026" for today + `days` on the UTC calendar. */
const dayFromToday = (days: number) => {
  const now = new Date();
  return DAY.format(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate() + days));
};

async function expectNoSideways(page: Page) {
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
}

test.describe("rider at phone size", () => {
  test.use({ viewport: { width: 390, height: 844 } });

  test("logs hours with a decimal comma and the service dates move", async ({ page, submitRequest, staffApi }) => {
    // Like demo request r09: motocross, 18 h a month.
    const { id, statusUrl } = await submitRequest(
      answersLike("r09", { name: "Hollis Hourlog", email: `hours.${uniqueStamp()}@example.test` }),
    );
    const tuner = await staffApi("tuner@sagwise.test");
    const approved = await tuner.post(`/api/requests/${id}/approve`, { data: {} });
    expect(approved.ok(), `approve answered ${approved.status()}`).toBe(true);

    await page.goto(statusUrl);
    const panel = page.getByRole("region", { name: "Next service" });
    // Fork oil, 15 h at 18 h/month: 0.8333 month × 30.436875 = 25.36 days → 26 days from today.
    const fork = panel.getByRole("listitem").filter({ hasText: "Fork oil change" });
    await expect(fork).toContainText(`Due ${dayFromToday(26)}`);
    await expectNoSideways(page);

    const form = page.getByRole("form", { name: "Log riding hours" });
    await form.getByLabel("Hours").fill("lots");
    await form.getByRole("button", { name: "Log hours" }).click();
    await expect(form.getByText("Enter the hours ridden as a number, like 2 or 1,5")).toBeVisible();

    await form.getByLabel("Hours").fill("12,5");
    await form.getByRole("button", { name: "Log hours" }).click();
    await expect(form.getByRole("status")).toContainText("12.5 h logged since your setup");
    // 2.5 h left at 18 h/month = 0.1389 month × 30.436875 = 4.23 days → 5 days from today.
    await expect(fork).toContainText(`Due ${dayFromToday(5)}`);
    // Shock service, 25 h: 12.5 h left = 0.6944 month × 30.436875 = 21.14 days → 22 days.
    await expect(panel.getByRole("listitem").filter({ hasText: "Shock service" })).toContainText(
      `Due ${dayFromToday(22)}`,
    );
    await expect(form.getByLabel("Hours")).toHaveValue("");
    await expectNoSideways(page);

    // The dates are kept: a reload shows the same.
    await page.reload();
    await expect(fork).toContainText(`Due ${dayFromToday(5)}`);
  });

  test("a reminder's booking link opens the request form with the bike chosen", async ({ page }) => {
    const bikeId = stableUuid("bike:mx-450-4t");
    // Start on the bike step (the draft the form keeps on the phone), then follow the link.
    await page.goto("/");
    await page.evaluate(() =>
      window.localStorage.setItem(
        "sagwise.request-draft.v1",
        JSON.stringify({ version: 1, step: 2, reached: 2, values: {}, savedAt: new Date().toISOString() }),
      ),
    );
    await page.goto(`/request?bike=${bikeId}`);
    await expect(page.getByText("Chosen:")).toContainText(/450/);
    await expect(page.locator(`input[type=radio][value="${bikeId}"]`)).toBeChecked();
  });
});

test.describe("staff", () => {
  test("the due-soon list names who is due, for what, when, and the last contact", async ({ page }) => {
    await signInWithPassword(page, "tuner@sagwise.test", "/shop");
    await page.getByRole("navigation", { name: "Workspace" }).getByRole("link", { name: "Due soon" }).click();
    await expect(page).toHaveURL("/shop/service");
    const table = page.getByRole("table", { name: "Services due soon or overdue" });
    // Demo r11: supercross at 40 h a month, approved 14 days ago: fork oil (10 h) long overdue.
    const row = table.getByRole("row").filter({ hasText: "Callum Ferreira-Stone" }).filter({ hasText: "Fork oil" });
    await expect(row).toContainText("Overdue since");
    await row.getByRole("link", { name: "Callum Ferreira-Stone" }).click();
    await expect(page.getByRole("heading", { name: "Service record" })).toBeVisible();
  });

  test("the admin's intervals page refuses a bad figure beside its field", async ({ page }) => {
    await signInWithPassword(page, "owner@sagwise.test", "/shop/settings");
    await page.getByRole("link", { name: "Service intervals and reminders" }).click();
    await expect(page).toHaveURL("/shop/settings/service");
    await page.getByLabel("Notice period (days before a service is due)").fill("-3");
    await page.getByLabel("Any discipline, Fork oil change: hours").fill("0");
    await page.getByRole("button", { name: "Save service intervals" }).click();
    await expect(page.getByText("The notice period cannot be negative")).toBeVisible();
    await expect(page.getByText("Hours must be more than 0")).toBeVisible();
    await expect(page.getByRole("alert").filter({ hasText: "Some fields need attention." })).toBeVisible();
  });
});
