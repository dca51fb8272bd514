// The staff workspace's review and queue, in the browser: opening a submitted request leaves it
// submitted (a GET never writes; "Start review" is the action); the queue takes a typed date, finds a
// request by its number and sorts status in workflow order both ways.
import { stableUuid } from "@/db/seed-data";
import { expect, signInWithPassword, test } from "./support/fixtures";

test("opening a submitted request changes nothing; Start review is the action", async ({ page, staffApi }) => {
  const api = await staffApi("tuner@sagwise.test");
  const id = stableUuid("request:r02");
  const before = await (await api.get(`/api/requests/${id}`)).json();
  expect(before.status).toBe("submitted");
  await signInWithPassword(page, "tuner@sagwise.test", "/shop");
  await page.goto(`/shop/requests/${id}`);
  await expect(page.getByRole("button", { name: "Start review", exact: true })).toBeVisible();
  const after = await (await api.get(`/api/requests/${id}`)).json();
  expect(after.status).toBe("submitted");
  expect(after.audit).toHaveLength(before.audit.length);
});

test("the queue takes a typed date, finds a request by its number and sorts status both ways", async ({ page }) => {
  await signInWithPassword(page, "tuner@sagwise.test", "/shop");
  const from = page.getByLabel("Received from");
  // What a US date field turned into 11/25/0006: read as 25 Nov 2026, no 400, the list stays.
  await from.fill("11252026");
  await expect(page.getByText("Read as 25 Nov 2026")).toBeVisible();
  await expect(page).toHaveURL(/from=2026-11-25/);
  // The list stays: no error from the server (the queue's own error box says "could not load").
  await expect(page.getByText(/could not load|must be a date/)).toHaveCount(0);
  await expect(page.getByText(/of \d+ requests/)).toBeVisible();
  await from.fill("");
  await from.fill("31.02.2026");
  await expect(page.getByText(/Not a date: type it like/)).toBeVisible();
  await from.fill("");

  const search = page.getByLabel(/Search rider, e-mail, bike or number/);
  await search.fill("7");
  await expect(page.getByRole("row").filter({ hasText: "Anselm Okonkwo-Reyes" })).toHaveCount(1);
  await search.fill("");

  const statusHeader = page.getByRole("button", { name: /^Status/ });
  await statusHeader.click();
  await expect(page.getByRole("columnheader", { name: /Status/ })).toHaveAttribute("aria-sort", "ascending");
  await expect(page.getByRole("row").nth(1)).toContainText("Submitted");
  await statusHeader.click();
  await expect(page.getByRole("columnheader", { name: /Status/ })).toHaveAttribute("aria-sort", "descending");
  await expect(page.getByRole("row").nth(1)).toContainText("Declined");
});
