// The staff workspace in the browser: every staff page (and the rider's public pages beside them) at
// a laptop's 1440×900 and a phone's 390×844 has no horizontal overflow outside its own scroll boxes,
// is clean of serious and critical axe-core findings (WCAG 2 A and AA) and shows no raw code and no
// zod default message (tests/helpers/vocabulary.ts). Then: opening a submitted request leaves it
// submitted (a GET never writes; "Start review" is the action); the queue takes a typed date, finds a
// request by its number and sorts status in workflow order both ways.
import AxeBuilder from "@axe-core/playwright";
import type { Page } from "@playwright/test";
import { stableUuid } from "@/db/seed-data";
import { demoStatusToken } from "@/lib/requests/token";
import { unspokenWords } from "../helpers/vocabulary";
import { E2E_AUTH_SECRET } from "./support/env";
import { expect, signInWithPassword, test } from "./support/fixtures";

const request = (key: string) => `/shop/requests/${stableUuid(`request:${key}`)}`;
const order = (key: string) => `/shop/workshop/${stableUuid(`order:${key}`)}`;
const bike = (key: string) => `/shop/catalog/${stableUuid(`bike:${key}`)}`;

/** Every staff page, with a seeded row where it needs one; the owner (admin) sees them all. */
const STAFF_PAGES = [
  "/shop",
  request("r02"), // submitted, not yet in review
  request("r04"), // in review: the editor
  request("r07"), // waiting for the rider's answer
  request("c01"), // approved, with a sag report
  "/shop/workshop",
  order("o1"),
  `${order("o1")}/build-sheet`,
  "/shop/service",
  "/shop/catalog",
  "/shop/catalog/new",
  bike("mx-450-4t"),
  `${bike("mx-125-2t")}/calibration`,
  "/shop/stock",
  "/shop/targets",
  "/shop/tools",
  "/shop/emails",
  "/shop/emails/wording",
  "/shop/team",
  "/shop/settings",
  "/shop/settings/orders",
  "/shop/settings/service",
];

const PUBLIC_PAGES = [
  "/",
  "/request",
  `/status/${demoStatusToken(E2E_AUTH_SECRET, stableUuid("request:r07"))}`,
  `/status/${demoStatusToken(E2E_AUTH_SECRET, stableUuid("request:c01"))}`,
];

/** What is wrong with the page as shown: overflow, serious or critical axe findings, unspoken words. */
async function problems(page: Page, width: number): Promise<string[]> {
  const found: string[] = [];
  const overflow = await page.evaluate((limit) => {
    const wide = document.documentElement.scrollWidth;
    if (wide <= limit) return null;
    // Name the widest elements that stick out: those outside any scroll box, and positioned ones
    // whose containing block lies outside their scroll box (they escape its clipping).
    const escapes = (el: HTMLElement) => {
      const box = el.parentElement?.closest<HTMLElement>(".overflow-x-auto");
      if (!box) return true;
      const position = getComputedStyle(el).position;
      return (position === "absolute" || position === "fixed") && getComputedStyle(box).position === "static";
    };
    const named = [...document.body.querySelectorAll<HTMLElement>("*")]
      .filter((el) => el.getBoundingClientRect().right > limit + 1 && escapes(el))
      .map((el) => ({
        what: `${el.tagName.toLowerCase()}${typeof el.className === "string" && el.className ? `.${el.className.split(/\s+/).slice(0, 3).join(".")}` : ""}`,
        right: Math.round(el.getBoundingClientRect().right),
      }))
      .sort((a, b) => b.right - a.right)
      .slice(0, 4)
      .map((e) => `${e.what} reaches ${e.right} px`);
    return `${wide} px wide: ${named.join("; ") || "nothing named"}`;
  }, width);
  if (overflow) found.push(`wider than ${width} px, ${overflow}`);
  const axe = await new AxeBuilder({ page }).exclude("iframe").withTags(["wcag2a", "wcag2aa"]).analyze();
  for (const v of axe.violations)
    if (v.impact === "serious" || v.impact === "critical")
      found.push(
        `axe ${v.id}: ${v.help} (${v.nodes
          .map((n) => n.target.join(" "))
          .slice(0, 3)
          .join(", ")})`,
      );
  for (const word of unspokenWords(await page.locator("body").innerText())) found.push(`shows ${word}`);
  return found;
}

/** Opens each page in turn; the problems found, by page (empty when every page is clean). */
async function walk(page: Page, paths: readonly string[], width: number): Promise<Record<string, string[]>> {
  const report: Record<string, string[]> = {};
  for (const path of paths) {
    const response = await page.goto(path);
    expect(response?.status(), path).toBe(200);
    await page.waitForLoadState("networkidle");
    const found = await problems(page, width);
    if (found.length) report[path] = found;
  }
  return report;
}

for (const viewport of [
  { width: 1440, height: 900 },
  { width: 390, height: 844 },
]) {
  test.describe(`every page at ${viewport.width}×${viewport.height}`, () => {
    test.use({ viewport });

    test("staff pages fit, pass axe-core and speak the shop's words", async ({ page }) => {
      test.setTimeout(240_000);
      await signInWithPassword(page, "owner@sagwise.test", "/shop");
      expect(await walk(page, STAFF_PAGES, viewport.width)).toEqual({});
    });

    test("public pages fit, pass axe-core and speak the rider's words", async ({ page }) => {
      test.setTimeout(120_000);
      expect(await walk(page, PUBLIC_PAGES, viewport.width)).toEqual({});
    });
  });
}

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
  await expect(page.getByText(/of \d+ requests/)).toBeVisible();
  // A filter lives in the URL only: changing it asks the server for the list, never for the page
  // again (the page's server part does not read the filters).
  const pageRequests: string[] = [];
  page.on("request", (request) => {
    if (new URL(request.url()).pathname === "/shop") pageRequests.push(request.url());
  });
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
  expect(pageRequests).toEqual([]);

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
