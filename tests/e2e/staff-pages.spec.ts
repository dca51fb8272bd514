// Every staff page, as the owner sees it, on a laptop (1440×900) and a phone (390×844): nothing
// wider than the screen (tables scroll inside their own box), axe-core finds no serious or critical
// issue, and the text on screen holds no internal code ("cross-country", "harsh-small-bumps",
// "shockLowSpeedCompression", "mx-450-4t", "in_review") and none of zod's default messages. A few
// public pages are read for codes too. Opening a submitted request leaves it submitted; the queue
// takes a typed date, finds a request by its number and sorts status in workflow order.
import AxeBuilder from "@axe-core/playwright";
import type { Page } from "@playwright/test";
import { stableUuid } from "@/db/seed-data";
import {
  ALL_LABEL_TABLES,
  AUDIT_ACTION_LABELS,
  EMAIL_TEMPLATE_LABELS,
  RATE_TRIGGER_LABELS,
  STAFF_NOTICE_LABELS,
} from "@/lib/labels";
import { demoStatusToken } from "@/lib/requests/token";
import { E2E_AUTH_SECRET } from "./support/env";
import { expect, signInWithPassword, test } from "./support/fixtures";

const request = (key: string) => `/shop/requests/${stableUuid(`request:${key}`)}`;
const STAFF_PAGES: [string, string][] = [
  ["queue", "/shop"],
  ["request, submitted", request("r01")],
  ["request, in review (cross-country)", request("r06")],
  ["request, waiting for the rider", request("r07")],
  ["request, approved with a sag report", request("r11")],
  ["request, declined", request("r12")],
  ["catalog", "/shop/catalog"],
  ["catalog model", `/shop/catalog/${stableUuid("bike:mx-450-4t")}`],
  ["new catalog model", "/shop/catalog/new"],
  ["calibration", `/shop/catalog/${stableUuid("bike:mx-125-2t")}/calibration`],
  ["stock", "/shop/stock"],
  ["e-mail previews", "/shop/emails"],
  ["tools", "/shop/tools"],
  ["targets", "/shop/targets"],
  ["team", "/shop/team"],
  ["settings", "/shop/settings"],
];
const demoToken = (key: string) => demoStatusToken(E2E_AUTH_SECRET, stableUuid(`request:${key}`));
const PUBLIC_PAGES: [string, string][] = [
  ["landing", "/"],
  ["status, in review (cross-country)", `/status/${demoToken("r06")}`],
  ["status, approved", `/status/${demoToken("r11")}`],
];

// Codes that are not also plain words (hyphenated, snake_case, camelCase), from the one vocabulary.
const RAW_CODES = [
  ...new Set(
    [
      ...Object.values(ALL_LABEL_TABLES).flatMap((t) => Object.keys(t)),
      ...Object.keys(AUDIT_ACTION_LABELS),
      ...Object.keys(EMAIL_TEMPLATE_LABELS),
      ...Object.keys(STAFF_NOTICE_LABELS),
      ...Object.keys(RATE_TRIGGER_LABELS),
    ].filter((code) => /[-_.]|[a-z][A-Z]/.test(code)),
  ),
];
const ZOD_DEFAULTS = [/expected \w+ to (be|have)/i, /expected \w+, received/i, /Too small/, /Too big/, /Invalid input/];

async function visibleText(page: Page): Promise<string> {
  // Options of closed selects are words a person picks from: read them too.
  return page.evaluate(
    () =>
      `${document.body.innerText}\n${[...document.querySelectorAll("option")].map((o) => o.textContent).join("\n")}`,
  );
}

async function check(page: Page, what: string, width: number, axe: boolean) {
  const problems: string[] = [];
  const scroll = await page.evaluate(() => document.documentElement.scrollWidth);
  if (scroll > width) {
    const wide = await page.evaluate((w) => {
      const out: string[] = [];
      for (const el of document.querySelectorAll("body *")) {
        const r = el.getBoundingClientRect();
        // The widest elements that stick out and are not inside a scroller of their own.
        if (r.right > w + 1 && !el.closest(".overflow-x-auto")) out.push(`${el.tagName.toLowerCase()}.${el.className}`);
      }
      return out.slice(0, 3);
    }, width);
    problems.push(`${what}: ${scroll} px wide at ${width} px (${wide.join(" | ")})`);
  }
  const text = await visibleText(page);
  for (const code of RAW_CODES)
    if (new RegExp(`(^|[^\\w/-])${code.replace(/\./g, "\\.")}($|[^\\w/-])`).test(text))
      problems.push(`${what}: shows the code "${code}"`);
  for (const pattern of ZOD_DEFAULTS) if (pattern.test(text)) problems.push(`${what}: shows zod's "${pattern}"`);
  if (axe) {
    const result = await new AxeBuilder({ page }).exclude("iframe").analyze();
    for (const v of result.violations.filter((x) => x.impact === "serious" || x.impact === "critical"))
      problems.push(`${what}: ${v.id} (${v.impact}) ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
  }
  return problems;
}

for (const [width, height] of [
  [1440, 900],
  [390, 844],
] as const) {
  test(`every staff page fits ${width} px, passes axe-core and shows words, not codes`, async ({ page }) => {
    test.setTimeout(240_000);
    await page.setViewportSize({ width, height });
    await signInWithPassword(page, "owner@sagwise.test", "/shop");
    const problems: string[] = [];
    for (const [what, path] of STAFF_PAGES) {
      await page.goto(path);
      await page.waitForLoadState("networkidle");
      await expect(page.getByRole("heading", { level: 1 }).first()).toBeVisible();
      problems.push(...(await check(page, what, width, true)));
    }
    if (width === 390)
      for (const [what, path] of PUBLIC_PAGES) {
        await page.goto(path);
        await page.waitForLoadState("networkidle");
        problems.push(...(await check(page, what, width, false)));
      }
    expect(problems).toEqual([]);
  });
}

test("opening a submitted request changes nothing; Start review is the action", async ({ page, staffApi }) => {
  const api = await staffApi("tuner@sagwise.test");
  const id = stableUuid("request:r02");
  const before = await (await api.get(`/api/requests/${id}`)).json();
  expect(before.status).toBe("submitted");
  await signInWithPassword(page, "tuner@sagwise.test", "/shop");
  await page.goto(`/shop/requests/${id}`);
  await expect(page.getByRole("button", { name: "Start review" })).toBeVisible();
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
