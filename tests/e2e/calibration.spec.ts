// Calibration from sag reports in the browser: the admin opens the demo 125's calibration from the
// catalog, sees its six seeded reports fitted, applies the fit (after confirming), a new request on the
// model says it used calibrated loads, and the admin undoes it again. The test leaves the model as
// the seed made it (nothing applied), so no other test sees calibrated loads.
import { stableUuid } from "@/db/seed-data";
import { expect, signInWithPassword, test, uniqueStamp } from "./support/fixtures";
import { answersLike } from "./support/requests";

const OWNER = "owner@sagwise.test";
const MODEL = stableUuid("bike:mx-125-2t");

test.describe("calibration from sag reports", () => {
  test("the admin applies the demo model's calibration, a new request uses it, and undo restores the catalog's", async ({
    page,
    staffApi,
    submitRequest,
  }) => {
    const api = await staffApi(OWNER);
    // Start from the seed's state even if an earlier run stopped half-way.
    const start = await api.get(`/api/shop/catalog/${MODEL}/calibration`);
    expect(start.status()).toBe(200);
    if (((await start.json()) as { applied: boolean }).applied)
      await api.post(`/api/shop/catalog/${MODEL}/calibration`, { data: { action: "undo" } });

    await signInWithPassword(page, OWNER, `/shop/catalog/${MODEL}`);
    await page.getByRole("link", { name: "Calibration from sag reports" }).click();
    await expect(page).toHaveURL(`/shop/catalog/${MODEL}/calibration`);
    await expect(page.getByRole("heading", { name: "Sag reports (6)" })).toBeVisible();
    await expect(page.getByText("The catalog's values", { exact: true })).toBeVisible();
    const loads = page.getByRole("table", { name: "Loads: catalog, fitted and applied" });
    await expect(loads.getByRole("columnheader", { name: "Fitted from 6 reports" })).toBeVisible();
    await expect(page.getByRole("img", { name: /Rear race sag against rider mass/ })).toBeVisible();

    // Nothing happens until the admin confirms.
    await page.getByRole("button", { name: "Apply to this model" }).click();
    const confirm = page.getByRole("alertdialog");
    await expect(confirm).toContainText("Recommendations already made keep theirs");
    await confirm.getByRole("button", { name: "Cancel" }).click();
    await expect(confirm).toHaveCount(0);
    await expect(page.getByText("The catalog's values", { exact: true })).toBeVisible();

    await page.getByRole("button", { name: "Apply to this model" }).click();
    await page.getByRole("button", { name: "Yes, apply the fitted loads" }).click();
    await expect(page.getByRole("status").filter({ hasText: "Calibration applied" })).toBeVisible();
    await expect(page.getByText(/Calibrated loads from 6 reports, applied .* by Mara Quillfeather/)).toBeVisible();
    await expect(loads.getByRole("columnheader", { name: "Applied now (6 reports)" })).toBeVisible();
    await expect(page.getByRole("button", { name: "Apply to this model" })).toBeDisabled();

    // A rider's new request on the model is sized with the calibrated loads, and the review says so.
    const stamp = uniqueStamp();
    const { id } = await submitRequest(
      answersLike("c03", { name: "Calibrated Rider", email: `calibrated.${stamp}@example.test` }),
    );
    await page.goto(`/shop/requests/${id}`);
    await expect(page.getByText("this version used the bike model's calibration from 6 sag reports")).toBeVisible();

    await page.goto(`/shop/catalog/${MODEL}/calibration`);
    await page.getByRole("button", { name: "Undo calibration" }).click();
    await page.getByRole("button", { name: "Yes, undo the calibration" }).click();
    await expect(page.getByRole("status").filter({ hasText: "Calibration undone" })).toBeVisible();
    await expect(page.getByText("The catalog's values", { exact: true })).toBeVisible();
    await expect(page.getByText(/; undone .* by Mara Quillfeather\./)).toBeVisible();

    // The request made while calibrated keeps what made it.
    await page.goto(`/shop/requests/${id}`);
    await expect(page.getByText("this version used the bike model's calibration from 6 sag reports")).toBeVisible();
  });

  test("a tuner cannot open the calibration page", async ({ page }) => {
    await signInWithPassword(page, "tuner@sagwise.test", `/shop/catalog/${MODEL}`);
    await expect(page.getByRole("link", { name: "Calibration from sag reports" })).toHaveCount(0);
    // The page streams, so the refusal arrives as the forbidden page rather than as the status line.
    await page.goto(`/shop/catalog/${MODEL}/calibration`);
    await expect(page.getByRole("heading", { name: "Not for this account" })).toBeVisible();
    await expect(page.getByRole("button", { name: "Apply to this model" })).toHaveCount(0);
  });
});
