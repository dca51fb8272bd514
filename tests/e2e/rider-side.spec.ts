// The rider's side at phone size (390×844): numbers typed with a decimal comma, one set of sag terms
// and reading labels, the signed-in rider, the unknown link, the earlier reports, the favicon.
import AxeBuilder from "@axe-core/playwright";
import type { Page } from "@playwright/test";
import { expect, test, uniqueStamp } from "./support/fixtures";
import { answersLike } from "./support/requests";

test.use({ viewport: { width: 390, height: 844 } });

async function expectAccessible(page: Page, what: string) {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(bad.map((v) => `${what}: ${v.id} (${v.impact})`)).toEqual([]);
}

const stepHeading = (page: Page) => page.getByRole("heading", { level: 2, name: /^Step \d of 5/ });

test.describe("numbers with a decimal comma", () => {
  test("the request form takes 86,5 kg and the review shows 86.5 kg", async ({ page }) => {
    await page.goto("/request");
    await page.evaluate(() => window.localStorage.clear());
    await page.reload();
    await page.getByLabel("Your name").fill("Comma Rider");
    await page.getByLabel("E-mail").fill(`comma.${uniqueStamp()}@example.test`);
    await page.getByLabel("Your weight").fill("86,5");
    await page.getByRole("radio", { name: "Advanced" }).check();
    await page.getByRole("radio", { name: "In between" }).check();
    await page.getByRole("button", { name: "Next" }).click();
    await expect(page.getByText("Enter the weight as a number")).toHaveCount(0);
    await expect(stepHeading(page)).toContainText("Step 2 of 5");
    await page.getByLabel("Hours ridden per month (optional)").fill("7,5");
    await page.getByRole("radio", { name: "Enduro" }).check();
    await page.getByRole("radio", { name: "Small (under 10 m)" }).check();
    await page.getByRole("button", { name: "Next" }).click();
    await expect(stepHeading(page)).toContainText("Step 3 of 5");
    await expectAccessible(page, "bike step");
  });

  test("the sag report takes 33,5 and 104,5 mm", async ({ page, submitRequest, staffApi }) => {
    const { id, statusUrl } = await submitRequest(
      answersLike("r09", { name: "Comma Sagreport", email: `comma.sag.${uniqueStamp()}@example.test` }),
    );
    const tuner = await staffApi("tuner@sagwise.test");
    expect((await tuner.post(`/api/requests/${id}/approve`, { data: {} })).ok()).toBe(true);
    await page.goto(statusUrl);
    const form = page.getByRole("form", { name: "Report measured sag" });
    await form.getByRole("group", { name: "Sag unit" }).getByText("mm").click();
    await form.getByLabel("Rear static sag").fill("33,5");
    await form.getByLabel("Rear race sag").fill("104,5");
    await form.getByRole("button", { name: "Check my sag" }).click();
    await expect(form.getByRole("status")).toHaveText(/Shock: Spring is (right|too soft|too stiff)/);
    await expectAccessible(page, "status page after a sag report");
  });
});
